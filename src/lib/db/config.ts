import path from 'node:path';
import type { Knex } from 'knex';

/** Default location of the database file, relative to the working directory. */
export const DEFAULT_DB_PATH = './data/loopwright.sqlite';

/** The database file in use: LOOPWRIGHT_DB when set, else the default under data/. */
export function databasePath(env: NodeJS.ProcessEnv = process.env): string {
  return path.resolve(env.LOOPWRIGHT_DB?.trim() || DEFAULT_DB_PATH);
}

/** Knex settings shared by the CLI (knexfile.ts) and the server. */
export function knexConfig(filename: string): Knex.Config {
  return {
    client: 'better-sqlite3',
    connection: { filename },
    useNullAsDefault: true,
    pool: {
      min: 1,
      max: 1,
      // WAL lets readers work while one writer commits; the busy timeout waits out a held lock
      // instead of failing with SQLITE_BUSY.
      afterCreate(conn: { pragma(sql: string): unknown }, done: (err: Error | null, conn: unknown) => void) {
        conn.pragma('journal_mode = WAL');
        conn.pragma('busy_timeout = 5000');
        conn.pragma('foreign_keys = ON');
        done(null, conn);
      },
    },
  };
}
