import type { Knex } from 'knex';
import { databasePath } from './config';
import { openDatabase } from './open';
import { bundledMigrations } from './migration-source';

let instance: Knex | undefined;
let ready: Promise<void> | undefined;

/** The server's one database handle (SQLite allows one writer; one connection avoids lock churn). */
export function db(): Knex {
  instance ??= openDatabase(databasePath());
  return instance;
}

/** Runs pending migrations once per process; every request awaits the same promise. */
export function ensureMigrated(): Promise<void> {
  ready ??= db()
    .migrate.latest({ migrationSource: bundledMigrations })
    .then(() => undefined)
    .catch((err: unknown) => {
      ready = undefined; // let a later request retry, e.g. after the disk is fixed
      throw err;
    });
  return ready;
}

export { bundledMigrations };
