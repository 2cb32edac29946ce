import fs from 'node:fs';
import path from 'node:path';
import type { Knex } from 'knex';
import { databasePath, knexConfig } from './src/lib/db/config';

const filename = databasePath();
// better-sqlite3 does not create folders.
fs.mkdirSync(path.dirname(filename), { recursive: true });

const config: Knex.Config = {
  ...knexConfig(filename),
  migrations: { directory: './migrations', extension: 'ts', loadExtensions: ['.ts'] },
  seeds: { directory: './src/lib/db/seeds', extension: 'ts', loadExtensions: ['.ts'] },
};

export default config;
