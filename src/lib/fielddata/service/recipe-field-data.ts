/** What a recipe page shows from the field: its evidence with small plots, and the loops following it. */
import type { Knex } from 'knex';
import { evidenceOfRecipe, type EvidenceRecord } from '../../db/evidence';
import { listLoops } from '../../db/loops';
import { findStepTest } from '../../db/step-tests';
import type { Loop } from '../../schemas/loop';
import { modelCurve } from '../fit';
import { sparkPaths, thinIndices } from '../sparkline';
import { loadSeries } from '../upload';

/** One piece of evidence with its plot: measured PV and the chosen model's curve. */
export interface EvidenceWithPlot extends EvidenceRecord {
  plot: { pv: string; fit: string; duration: number } | null;
}

const cache = new Map<number, EvidenceWithPlot['plot']>();
const CACHE_MAX = 64;
const SPARK_POINTS = 120;

export async function recipeFieldData(knex: Knex, folder: string, slug: string): Promise<{ evidence: EvidenceWithPlot[]; loops: Loop[] }> {
  const [evidence, loops] = await Promise.all([evidenceOfRecipe(knex, slug), listLoops(knex, { recipe: slug })]);
  return { evidence: await withPlots(knex, folder, evidence), loops };
}

/** Evidence with its small plots. */
export async function withPlots(knex: Knex, folder: string, evidence: EvidenceRecord[]): Promise<EvidenceWithPlot[]> {
  const out: EvidenceWithPlot[] = [];
  for (const e of evidence) out.push({ ...e, plot: await plotOf(knex, folder, e) });
  return out;
}

/** Loops still following a recipe (the retire dialog lists them). */
export function loopsFollowing(knex: Knex, slug: string): Promise<Loop[]> {
  return listLoops(knex, { recipe: slug });
}

/** Evidence ids never change what they point to, so plots are cached by id. */
async function plotOf(knex: Knex, folder: string, e: EvidenceRecord): Promise<EvidenceWithPlot['plot']> {
  if (cache.has(e.id)) return cache.get(e.id)!;
  let plot: EvidenceWithPlot['plot'] = null;
  try {
    const stepTest = await findStepTest(knex, e.stepTestId);
    if (stepTest) {
      const series = loadSeries(folder, stepTest);
      const idx = thinIndices(series.t.length, SPARK_POINTS);
      const t = idx.map((i) => series.t[i]);
      const [pv, fit] = sparkPaths(t, [idx.map((i) => series.pv[i]), modelCurve(series, e.model, t)]);
      plot = { pv, fit, duration: t[t.length - 1] - t[0] };
    }
  } catch (err) {
    // A missing or damaged file must not take the recipe page down; the list shows "no plot".
    console.error(`Evidence ${e.id}: no plot (${err instanceof Error ? err.message : err})`);
  }
  if (cache.size >= CACHE_MAX) cache.delete(cache.keys().next().value!);
  cache.set(e.id, plot);
  return plot;
}
