import type { Knex } from 'knex';

/** A row of `recipes`: one authored recipe's workflow state. */
export interface AuthoredRecipeRow {
  id: number;
  slug: string;
  status: string;
  owner_id: string;
  owner_email: string;
  owner_name: string;
  current_revision: number;
  created_at: string;
  updated_at: string;
  submitted_at: string | null;
  published_at: string | null;
  reviewed_at: string | null;
  retired_at: string | null;
  retired_reason: string | null;
  superseded_by: string | null;
  review_comment: string | null;
}

/** A row of `recipe_revisions`: one save, never changed afterwards. */
export interface RevisionRow {
  id: number;
  recipe_id: number;
  revision: number;
  author_id: string;
  author_email: string;
  created_at: string;
  message: string;
  frontmatter_json: string;
  body: string;
  html: string;
}

/** A recipe row joined with its current revision. */
export type AuthoredRecipeWithRevision = AuthoredRecipeRow & { revision: RevisionRow };

export function findRecipeRow(knex: Knex, slug: string): Promise<AuthoredRecipeRow | undefined> {
  return knex<AuthoredRecipeRow>('recipes').where({ slug }).first();
}

export async function findRecipeWithRevision(knex: Knex, slug: string): Promise<AuthoredRecipeWithRevision | null> {
  const row = await findRecipeRow(knex, slug);
  if (!row) return null;
  const revision = await findRevision(knex, row.id, row.current_revision);
  return revision ? { ...row, revision } : null;
}

/** All authored recipes with their current revisions, newest change first. */
export async function listRecipesWithRevisions(knex: Knex, statuses?: string[]): Promise<AuthoredRecipeWithRevision[]> {
  const q = knex('recipes as r')
    .join('recipe_revisions as v', function () {
      this.on('v.recipe_id', '=', 'r.id').andOn('v.revision', '=', 'r.current_revision');
    })
    .select('r.*', knex.raw('v.id as v_id'), 'v.author_id', 'v.author_email', knex.raw('v.created_at as v_created_at'), 'v.message', 'v.frontmatter_json', 'v.body', 'v.html')
    .orderBy('r.updated_at', 'desc');
  if (statuses) q.whereIn('r.status', statuses);
  const rows = await q;
  return rows.map((x: Record<string, unknown>) => {
    const { v_id, author_id, author_email, v_created_at, message, frontmatter_json, body, html, ...r } = x;
    const recipe = r as unknown as AuthoredRecipeRow;
    return {
      ...recipe,
      revision: { id: v_id, recipe_id: recipe.id, revision: recipe.current_revision, author_id, author_email, created_at: v_created_at, message, frontmatter_json, body, html } as RevisionRow,
    };
  });
}

export function findRevision(knex: Knex, recipeId: number, revision: number): Promise<RevisionRow | undefined> {
  return knex<RevisionRow>('recipe_revisions').where({ recipe_id: recipeId, revision }).first();
}

/** Every revision of a recipe, oldest first, without bodies (for the history list). */
export function listRevisions(knex: Knex, recipeId: number): Promise<Omit<RevisionRow, 'body' | 'html' | 'frontmatter_json'>[]> {
  return knex('recipe_revisions')
    .where({ recipe_id: recipeId })
    .select('id', 'recipe_id', 'revision', 'author_id', 'author_email', 'created_at', 'message')
    .orderBy('revision', 'asc');
}

export async function slugTaken(knex: Knex, slug: string): Promise<boolean> {
  return Boolean(await knex('recipes').where({ slug }).first('id'));
}

export async function insertRecipe(knex: Knex, row: Omit<AuthoredRecipeRow, 'id'>): Promise<number> {
  const [id] = await knex('recipes').insert(row);
  return Number(id);
}

export async function insertRevision(knex: Knex, row: Omit<RevisionRow, 'id'>): Promise<void> {
  await knex('recipe_revisions').insert(row);
}

/**
 * Moves the recipe to `nextRevision` only if it still is at `expectedRevision` (optimistic
 * locking); false when someone else saved first.
 */
export async function advanceRevision(knex: Knex, id: number, expectedRevision: number, changes: Partial<AuthoredRecipeRow>): Promise<boolean> {
  const n = await knex('recipes').where({ id, current_revision: expectedRevision }).update(changes);
  return n === 1;
}

export async function updateRecipeRow(knex: Knex, id: number, changes: Partial<AuthoredRecipeRow>): Promise<void> {
  await knex('recipes').where({ id }).update(changes);
}
