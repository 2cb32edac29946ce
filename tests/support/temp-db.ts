import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Knex } from 'knex';
import { openDatabase } from '../../src/lib/db/open';
import { bundledMigrations } from '../../src/lib/db/migration-source';

// Vitest transforms TypeScript only for modules it loads itself, so tests migrate through the
// same bundled source as the built server rather than Knex's directory loader.
const MIGRATIONS = { migrationSource: bundledMigrations };

/** A fresh SQLite file in a temporary folder, migrated to the latest schema unless told not to. */
export async function tempDatabase(options: { migrate?: boolean } = {}): Promise<{ knex: Knex; file: string; cleanup(): Promise<void> }> {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'loopwright-db-'));
  const file = path.join(dir, 'nested', 'test.sqlite');
  const knex = openDatabase(file);
  if (options.migrate ?? true) await knex.migrate.latest(MIGRATIONS);
  return {
    knex,
    file,
    async cleanup() {
      await knex.destroy();
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}
