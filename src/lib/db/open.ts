import fs from 'node:fs';
import path from 'node:path';
import knex, { type Knex } from 'knex';
import { knexConfig } from './config';

/** Opens (and creates, with its folder) the SQLite database at `filename`. */
export function openDatabase(filename: string): Knex {
  // better-sqlite3 does not create folders.
  fs.mkdirSync(path.dirname(filename), { recursive: true });
  return knex(knexConfig(filename));
}
