import type { Knex } from 'knex';

/**
 * Brindlewood Creamery's loop register for the demo: invented tags, owners and tuning. Each
 * loop follows one of the team's file recipes (content/recipes).
 */
const LOOPS = [
  { tag: 'FIC-101', area: 'silos', description: 'Raw-milk reception flow, bay 1', recipe: 'raw-milk-reception-flow', tuning: { form: 'ideal', gain: 0.45, integral: 6, derivative: null, timeUnit: 's', gainUnit: '%/%' }, by: 'Oren Castellano', at: '2025-04-14', owner: 'oren.castellano@brindlewood.example' },
  { tag: 'FIC-102', area: 'silos', description: 'Raw-milk reception flow, bay 2', recipe: 'raw-milk-reception-flow', tuning: { form: 'ideal', gain: 0.5, integral: 6.5, derivative: null, timeUnit: 's', gainUnit: '%/%' }, by: 'Oren Castellano', at: '2022-09-02', owner: 'oren.castellano@brindlewood.example' },
  { tag: 'TIC-130', area: 'silos', description: 'Silo 3 jacket temperature', recipe: 'raw-milk-silo-temperature-pid', tuning: { form: 'series', gain: 2.2, integral: 6, derivative: 1, timeUnit: 'min', gainUnit: '%/°C' }, by: 'Hanne Vos', at: '2021-03-22', owner: 'hanne.vos@brindlewood.example' },
  { tag: 'TIC-210', area: 'htst', description: 'HTST product outlet temperature (outer loop of the cascade)', recipe: 'htst-product-temperature-cascade', tuning: { form: 'ideal', gain: 1.9, integral: 38, derivative: null, timeUnit: 's', gainUnit: '%/°C' }, by: 'Hanne Vos', at: '2026-02-10', owner: 'hanne.vos@brindlewood.example' },
  { tag: 'TIC-250', area: 'htst', description: 'Second HTST (yoghurt line) outlet temperature, still on the single-loop scheme', recipe: 'htst-product-temperature-single-loop', tuning: { form: 'ideal', gain: 1.2, integral: 45, derivative: null, timeUnit: 's', gainUnit: '%/°C' }, by: 'Oren Castellano', at: '2023-05-09', owner: 'oren.castellano@brindlewood.example' },
  { tag: 'LIC-220', area: 'htst', description: 'HTST balance tank level', recipe: 'htst-balance-tank-level-averaging', tuning: { form: 'ideal', gain: 1.1, integral: 600, derivative: null, timeUnit: 's', gainUnit: '%/%' }, by: 'Oren Castellano', at: '2024-06-30', owner: 'oren.castellano@brindlewood.example' },
  { tag: 'TIC-315', area: 'cip', description: 'CIP return temperature', recipe: 'cip-return-temperature-dead-time', tuning: { form: 'ideal', gain: 0.8, integral: 2.5, derivative: null, timeUnit: 'min', gainUnit: '%/°C' }, by: 'Priya Lindgren', at: '2023-01-18', owner: 'priya.lindgren@brindlewood.example' },
  { tag: 'PIC-402', area: 'boiler', description: 'Steam header pressure', recipe: 'boiler-steam-header-pressure', tuning: { form: 'series', gain: 2.4, integral: 3, derivative: 0.5, timeUnit: 'min', gainUnit: '%/%' }, by: 'Priya Lindgren', at: '2025-10-05', owner: 'priya.lindgren@brindlewood.example' },
  { tag: 'AIC-710', area: 'wastewater', description: 'Neutralisation stage 1 pH', recipe: 'wastewater-ph-neutralisation', tuning: null, by: null, at: null, owner: 'hanne.vos@brindlewood.example' },
] as const;

/** Inserts the demo loops that are missing; running it twice changes nothing. */
export async function seed(knex: Knex): Promise<void> {
  const stamp = '2026-11-01T08:00:00.000Z';
  await knex('loops')
    .insert(LOOPS.map((l) => ({
      tag: l.tag, area: l.area, description: l.description, recipe_slug: l.recipe, tuning: l.tuning ? JSON.stringify(l.tuning) : null,
      commissioned_by: l.by, commissioned_at: l.at, owner_email: l.owner, created_at: stamp, updated_at: stamp,
    })))
    .onConflict('tag')
    .ignore();
}
