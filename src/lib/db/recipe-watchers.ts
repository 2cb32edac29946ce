import type { Knex } from 'knex';

export async function addWatcher(knex: Knex, slug: string, user: { id: string; email: string }, now: string): Promise<void> {
  await knex('recipe_watchers').insert({ recipe_slug: slug, user_id: user.id, user_email: user.email, created_at: now }).onConflict(['recipe_slug', 'user_id']).ignore();
}

export async function removeWatcher(knex: Knex, slug: string, userId: string): Promise<void> {
  await knex('recipe_watchers').where({ recipe_slug: slug, user_id: userId }).delete();
}

export async function isWatching(knex: Knex, slug: string, userId: string): Promise<boolean> {
  return Boolean(await knex('recipe_watchers').where({ recipe_slug: slug, user_id: userId }).first('user_id'));
}

/** Addresses of everyone watching `slug`, except `exceptUserId` (the person who acted). */
export async function watcherEmails(knex: Knex, slug: string, exceptUserId: string | null = null): Promise<string[]> {
  const q = knex('recipe_watchers').where({ recipe_slug: slug });
  if (exceptUserId) q.whereNot({ user_id: exceptUserId });
  return (await q.select('user_email')).map((r: { user_email: string }) => r.user_email);
}

export async function watcherCount(knex: Knex, slug: string): Promise<number> {
  const row = await knex('recipe_watchers').where({ recipe_slug: slug }).count({ n: '*' }).first();
  return Number(row?.n ?? 0);
}
