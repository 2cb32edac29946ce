import { afterEach, describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { tempDatabase } from '../../support/temp-db';
import { checkDatabase } from '../../../src/lib/db/health';

let cleanup: (() => Promise<void>) | undefined;
afterEach(async () => {
  await cleanup?.();
  cleanup = undefined;
});

/** A migration source with one migration that never ran, to stand for a schema behind the code. */
const sourceWithExtra: Knex.MigrationSource<string> = {
  async getMigrations() {
    return ['20990101000000_future_change.ts'];
  },
  getMigrationName: (m) => m,
  async getMigration() {
    return { up: async () => {}, down: async () => {} };
  },
};

describe('checkDatabase', () => {
  it('reports pending migrations by name', async () => {
    const t = await tempDatabase({ migrate: false });
    cleanup = t.cleanup;
    const health = await checkDatabase(t.knex, sourceWithExtra);
    expect(health).toMatchObject({ reachable: true, migrationsCurrent: false, pendingMigrations: ['20990101000000_future_change.ts'] });
  });

  it('reports a database that cannot be queried as unreachable', async () => {
    const t = await tempDatabase({ migrate: false });
    await t.cleanup();
    const health = await checkDatabase(t.knex, sourceWithExtra);
    expect(health.reachable).toBe(false);
    expect(health.error).toBeTruthy();
  });
});
