import type { Knex } from 'knex';

/** What GET /api/health reports about the database. */
export interface DatabaseHealth {
  reachable: boolean;
  migrationsCurrent: boolean;
  pendingMigrations: string[];
  error?: string;
}

/** Checks that the database answers a query and that no migration is pending. */
export async function checkDatabase(
  knex: Knex,
  migrationSource: Knex.MigrationSource<unknown>,
): Promise<DatabaseHealth> {
  try {
    await knex.raw('select 1');
  } catch (err) {
    return { reachable: false, migrationsCurrent: false, pendingMigrations: [], error: message(err) };
  }
  try {
    const [, pending] = (await knex.migrate.list({ migrationSource })) as [unknown[], unknown[]];
    const names = pending.map((m) => (typeof m === 'string' ? m : migrationSource.getMigrationName(m)));
    return { reachable: true, migrationsCurrent: names.length === 0, pendingMigrations: names };
  } catch (err) {
    return { reachable: true, migrationsCurrent: false, pendingMigrations: [], error: message(err) };
  }
}

function message(err: unknown): string {
  return err instanceof Error ? err.message : String(err);
}
