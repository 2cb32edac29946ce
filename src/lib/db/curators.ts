import type { Knex } from 'knex';

/** Curators of the installation (e-mail addresses), from the accounts table; empty before it exists. */
export async function curatorEmails(knex: Knex): Promise<string[]> {
  if (!(await knex.schema.hasTable('users'))) return [];
  const rows = await knex('users').whereIn('role', ['curator', 'admin']).andWhere({ banned: 0 }).select('email');
  return rows.map((r: { email: string }) => r.email);
}
