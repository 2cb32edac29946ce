import type { Knex } from 'knex';

type MigrationModule = Pick<Knex.Migration, 'up' | 'down'>;

// Bundled at build time, so the built server needs no TypeScript loader. Names are file
// basenames, exactly what the Knex CLI records, so both agree about what has run.
const modules = import.meta.glob<MigrationModule>('../../../migrations/*.ts', { eager: true });

/** The migrations folder as a Knex migration source for the built server. */
export const bundledMigrations: Knex.MigrationSource<string> = {
  async getMigrations() {
    return Object.keys(modules).sort();
  },
  getMigrationName(key) {
    return key.slice(key.lastIndexOf('/') + 1);
  },
  async getMigration(key) {
    return modules[key];
  },
};
