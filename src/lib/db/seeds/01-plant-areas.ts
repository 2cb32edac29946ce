import type { Knex } from 'knex';

/** Brindlewood Creamery, the fictional dairy plant of the demo. */
export const BRINDLEWOOD_AREAS = [
  { code: 'silos', name: 'Raw-milk silos', description: 'Reception bays and four 60 m³ silos.' },
  { code: 'htst', name: 'HTST pasteurizer', description: 'Plate pasteurizer, 18 m³/h, 72 °C hold.' },
  { code: 'cip', name: 'CIP skid', description: 'Three-tank clean-in-place skid: rinse, caustic, acid.' },
  { code: 'boiler', name: 'Boiler house', description: 'Two fire-tube boilers, 10 barg steam header.' },
  { code: 'glycol', name: 'Glycol chiller', description: 'Propylene-glycol loop at −4 °C for the silos and coolers.' },
  { code: 'wastewater', name: 'Wastewater pH', description: 'Balance tank and two-stage pH neutralisation.' },
  { code: 'packaging', name: 'Packaging conveyors', description: 'Filler infeed, case packers and palletiser conveyors.' },
] as const;

/** Inserts the demo areas that are missing; running it twice changes nothing. */
export async function seed(knex: Knex): Promise<void> {
  await knex('plant_areas').insert(BRINDLEWOOD_AREAS.map((a) => ({ ...a }))).onConflict('code').ignore();
}
