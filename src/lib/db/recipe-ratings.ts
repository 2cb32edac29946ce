import type { Knex } from 'knex';

export interface RatingRow {
  recipe_slug: string;
  user_id: string;
  user_email: string;
  user_name: string;
  stars: number;
  note: string | null;
  created_at: string;
  updated_at: string;
}

/** Average stars (null when nobody rated) and how many people rated. */
export interface RatingSummary {
  average: number | null;
  count: number;
}

/** One rating per person per recipe: a second call replaces the first (keeping when it was first given). */
export async function upsertRating(knex: Knex, row: Omit<RatingRow, 'created_at'> & { now: string }): Promise<void> {
  const { now, ...rest } = row;
  await knex('recipe_ratings')
    .insert({ ...rest, created_at: now, updated_at: now })
    .onConflict(['recipe_slug', 'user_id'])
    .merge(['stars', 'note', 'user_email', 'user_name', 'updated_at']);
}

export async function ratingSummary(knex: Knex, slug: string): Promise<RatingSummary> {
  const row = await knex('recipe_ratings').where({ recipe_slug: slug }).avg({ average: 'stars' }).count({ count: '*' }).first();
  const count = Number(row?.count ?? 0);
  return { average: count ? Math.round(Number(row?.average) * 100) / 100 : null, count };
}

/** Rating summaries of every rated recipe, by slug. */
export async function allRatingSummaries(knex: Knex): Promise<Map<string, RatingSummary>> {
  const rows = await knex('recipe_ratings').select('recipe_slug').avg({ average: 'stars' }).count({ count: '*' }).groupBy('recipe_slug');
  return new Map(rows.map((r: Record<string, unknown>) => [String(r.recipe_slug), { average: Math.round(Number(r.average) * 100) / 100, count: Number(r.count) }]));
}

/** Ratings with a field note, newest first. */
export function listFieldNotes(knex: Knex, slug: string): Promise<RatingRow[]> {
  return knex<RatingRow>('recipe_ratings').where({ recipe_slug: slug }).whereNotNull('note').andWhere('note', '<>', '').orderBy('updated_at', 'desc');
}

export function findRating(knex: Knex, slug: string, userId: string): Promise<RatingRow | undefined> {
  return knex<RatingRow>('recipe_ratings').where({ recipe_slug: slug, user_id: userId }).first();
}
