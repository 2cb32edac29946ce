import type { Knex } from 'knex';
import * as plantAreas from './seeds/01-plant-areas';
import * as demoUsers from './seeds/02-demo-users';
import * as loopRegister from './seeds/05-loop-register';

/** Every demo seed in order; each one is idempotent. New seeds are added here and in seeds/. */
const SEEDS: { name: string; seed(knex: Knex): Promise<void> }[] = [
  { name: 'plant-areas', ...plantAreas },
  { name: 'demo-users', ...demoUsers },
  { name: 'loop-register', ...loopRegister },
];

const SEEDED_KEY = 'demo_seeded_at';

/** Loads the demo data (idempotent) and records when. */
export async function seedDemo(knex: Knex): Promise<void> {
  for (const s of SEEDS) await s.seed(knex);
  await knex('app_meta')
    .insert({ key: SEEDED_KEY, value: new Date().toISOString(), updated_at: new Date().toISOString() })
    .onConflict('key')
    .ignore();
}

/** True once the demo data has been loaded into this database. */
export async function demoSeeded(knex: Knex): Promise<boolean> {
  return Boolean(await knex('app_meta').where({ key: SEEDED_KEY }).first());
}
