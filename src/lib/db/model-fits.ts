import type { Knex } from 'knex';
import type { ProcessModel } from '../control/types';

/** A stored model fit. */
export interface ModelFitRecord {
  id: number;
  stepTestId: number;
  type: ProcessModel['type'];
  model: ProcessModel;
  rmse: number;
  r2: number;
  /** Whether this is the model picked for the test's evidence. */
  chosen: boolean;
  fittedBy: string;
  fittedAt: string;
}

type Row = { id: number; step_test_id: number; type: string; params: string; rmse: number; r2: number; chosen: number | boolean; fitted_by: string; fitted_at: string };

/** Stores fits of one test (in a transaction of the caller's if given) and answers them with ids. */
export async function insertFits(
  knex: Knex,
  stepTestId: number,
  fits: { model: ProcessModel; rmse: number; r2: number }[],
  by: string,
  now = new Date(),
): Promise<ModelFitRecord[]> {
  return knex.transaction(async (trx) => {
    const out: ModelFitRecord[] = [];
    for (const f of fits) {
      const [row] = await trx('model_fits')
        .insert({ step_test_id: stepTestId, type: f.model.type, params: JSON.stringify(f.model), rmse: f.rmse, r2: f.r2, chosen: false, fitted_by: by, fitted_at: now.toISOString() })
        .returning('id');
      const id = typeof row === 'object' ? row.id : row;
      out.push({ id, stepTestId, type: f.model.type, model: f.model, rmse: f.rmse, r2: f.r2, chosen: false, fittedBy: by, fittedAt: now.toISOString() });
    }
    return out;
  });
}

/** One fit, or null. */
export async function findFit(knex: Knex, id: number): Promise<ModelFitRecord | null> {
  const row = await knex<Row>('model_fits').where({ id }).first();
  return row ? fromRow(row) : null;
}

/** The fits of a step test, oldest first. */
export async function fitsOfTest(knex: Knex, stepTestId: number): Promise<ModelFitRecord[]> {
  return (await knex<Row>('model_fits').where({ step_test_id: stepTestId }).orderBy('id')).map(fromRow);
}

/** Marks one fit as the chosen one of its test (and no other). */
export async function chooseFit(trx: Knex, fit: ModelFitRecord): Promise<void> {
  await trx('model_fits').where({ step_test_id: fit.stepTestId }).update({ chosen: false });
  await trx('model_fits').where({ id: fit.id }).update({ chosen: true });
}

function fromRow(r: Row): ModelFitRecord {
  const model = JSON.parse(r.params) as ProcessModel;
  return { id: r.id, stepTestId: r.step_test_id, type: model.type, model, rmse: r.rmse, r2: r.r2, chosen: Boolean(r.chosen), fittedBy: r.fitted_by, fittedAt: r.fitted_at };
}
