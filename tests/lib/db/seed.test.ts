import { afterEach, describe, expect, it } from 'vitest';
import type { Knex } from 'knex';
import { tempDatabase } from '../../support/temp-db';
import { demoSeeded, seedDemo } from '../../../src/lib/db/seed';

let cleanup: (() => Promise<void>) | undefined;
afterEach(async () => {
  await cleanup?.();
  cleanup = undefined;
});

/** Every user table with its row count, so a second seed can be compared with the first. */
async function snapshot(knex: Knex): Promise<Record<string, unknown[]>> {
  const tables: { name: string }[] = await knex.raw(
    "select name from sqlite_master where type = 'table' and name not like 'knex_%' and name not like 'sqlite_%' and name != 'app_meta'",
  );
  const out: Record<string, unknown[]> = {};
  for (const { name } of tables) out[name] = await knex(name).select('*');
  return out;
}

describe('seedDemo', () => {
  it('loads the demo data and changes nothing when run a second time', async () => {
    const t = await tempDatabase();
    cleanup = t.cleanup;
    expect(await demoSeeded(t.knex)).toBe(false);
    await seedDemo(t.knex);
    const first = await snapshot(t.knex);
    expect(await demoSeeded(t.knex)).toBe(true);
    expect((first.plant_areas ?? []).length).toBeGreaterThanOrEqual(7);
    await seedDemo(t.knex);
    expect(await snapshot(t.knex)).toEqual(first);
  });
});
