import type { Knex } from 'knex';
import type { EvidenceTuning } from '../schemas/evidence';
import type { ProcessModel } from '../control/types';

/** Evidence as the API and the recipe page show it. */
export interface EvidenceRecord {
  id: number;
  recipeSlug: string;
  stepTestId: number;
  fitId: number;
  /** The chosen model (from the fit). */
  model: ProcessModel;
  fit: { rmse: number; r2: number };
  /** Tag and area of the tested loop (from the step test). */
  tag: string;
  area: string | null;
  tuning: EvidenceTuning;
  note: string;
  createdBy: string;
  createdAt: string;
}

type Row = {
  id: number; recipe_slug: string; step_test_id: number; fit_id: number; tuning: string; note: string; created_by: string; created_at: string;
  params: string; rmse: number; r2: number; tag: string; area: string | null;
};

/** Inserts evidence (inside the caller's transaction) and answers its id. */
export async function insertEvidence(
  trx: Knex,
  e: { recipeSlug: string; stepTestId: number; fitId: number; tuning: EvidenceTuning; note: string; createdBy: string; createdAt: string },
): Promise<number> {
  const [row] = await trx('evidence')
    .insert({ recipe_slug: e.recipeSlug, step_test_id: e.stepTestId, fit_id: e.fitId, tuning: JSON.stringify(e.tuning), note: e.note, created_by: e.createdBy, created_at: e.createdAt })
    .returning('id');
  return typeof row === 'object' ? row.id : row;
}

function base(knex: Knex) {
  return knex('evidence as e')
    .join('model_fits as f', 'f.id', 'e.fit_id')
    .join('step_tests as s', 's.id', 'e.step_test_id')
    .select('e.*', 'f.params', 'f.rmse', 'f.r2', 's.tag', 's.area');
}

/** One piece of evidence, or null. */
export async function findEvidence(knex: Knex, id: number): Promise<EvidenceRecord | null> {
  const row = (await base(knex).where('e.id', id).first()) as Row | undefined;
  return row ? fromRow(row) : null;
}

/** Evidence behind a recipe, newest first. */
export async function evidenceOfRecipe(knex: Knex, slug: string): Promise<EvidenceRecord[]> {
  return ((await base(knex).where('e.recipe_slug', slug).orderBy('e.id', 'desc')) as Row[]).map(fromRow);
}

/** Evidence linked to a loop, newest first. */
export async function evidenceOfLoop(knex: Knex, loopId: number): Promise<EvidenceRecord[]> {
  const rows = (await base(knex).join('loop_evidence as le', 'le.evidence_id', 'e.id').where('le.loop_id', loopId).orderBy('e.id', 'desc')) as Row[];
  return rows.map(fromRow);
}

function fromRow(r: Row): EvidenceRecord {
  return {
    id: r.id, recipeSlug: r.recipe_slug, stepTestId: r.step_test_id, fitId: r.fit_id,
    model: JSON.parse(r.params), fit: { rmse: r.rmse, r2: r.r2 }, tag: r.tag, area: r.area,
    tuning: JSON.parse(r.tuning), note: r.note, createdBy: r.created_by, createdAt: r.created_at,
  };
}
