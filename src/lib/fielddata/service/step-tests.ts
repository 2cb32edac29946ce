/**
 * Step tests from upload to fitted models: preview (nothing stored), upload (all or nothing),
 * read back, fit with the three models and rank recipes for each fit.
 */
import type { Knex } from 'knex';
import { z } from 'zod';
import { LoopTagSchema } from '../../schemas/loop';
import { fitsOfTest, insertFits, type ModelFitRecord } from '../../db/model-fits';
import { findStepTest, type StepTestRecord } from '../../db/step-tests';
import type { Actor } from '../actor';
import { ColumnMappingSchema, readStepTestFile, suggestMapping, STEP_TEST_LIMITS, type ColumnMapping, type CsvTable } from '../csv';
import { fitPlot, fitSeries, MODEL_TYPES, type FitPlot } from '../fit';
import { loopTypeOfTag } from '../loop-type';
import { matchRecipes, type RecipeMatch } from '../match';
import { fromZod, invalid, invalidFile, missing } from '../problem';
import type { RecipeCatalog } from '../recipe-catalog';
import { loadSeries, storeStepTest } from '../upload';

/** Rows shown in the preview. */
export const PREVIEW_ROWS = 20;

/** What the preview shows before anything is stored. */
export interface StepTestPreview {
  dialect: CsvTable['dialect'];
  header: string[] | null;
  columns: number;
  rowCount: number;
  rows: { line: number; cells: string[] }[];
  suggestedMapping: ColumnMapping;
  /** Malformed rows found while splitting (mapping-independent), the first ones. */
  issues: { line: number | null; column: number | null; message: string }[];
  issueCount: number;
}

/** Splits a file for the preview; whole-file problems are refused. */
export function previewStepTest(bytes: Uint8Array): StepTestPreview {
  const read = readStepTestFile(bytes);
  if (read.issue) throw invalidFile([read.issue], 1);
  const t = read.table;
  return {
    dialect: t.dialect, header: t.header, columns: t.columns, rowCount: t.rows.length,
    rows: t.rows.slice(0, PREVIEW_ROWS), suggestedMapping: suggestMapping(t),
    issues: t.issues.slice(0, STEP_TEST_LIMITS.maxListedIssues), issueCount: t.issues.length,
  };
}

/** The form fields of an upload besides the file (multipart text fields). */
export const StepTestFieldsSchema = z.object({
  /** ISA-5.1 tag of the loop tested. */
  tag: LoopTagSchema,
  /** Plant area code; empty = not said. */
  area: z.string().trim().max(40).optional().transform((a) => a || null),
  /** Free note: conditions of the test, valve, operator. */
  note: z.string().trim().max(2000).default(''),
  /** Column mapping as JSON; absent = the suggested mapping. */
  mapping: z.string().optional(),
});

/** Stores an upload, answering the record and the series' extent; refuses with every issue by line. */
export async function uploadStepTest(
  knex: Knex,
  folder: string,
  actor: Actor,
  upload: { bytes: Uint8Array; fileName: string; fields: Record<string, unknown> },
): Promise<{ stepTest: PublicStepTest; rowCount: number; duration: number }> {
  const fields = StepTestFieldsSchema.safeParse(upload.fields);
  if (!fields.success) throw fromZod(fields.error);
  const { tag, area, note } = fields.data;
  if (area && !(await knex('plant_areas').where({ code: area }).first())) {
    const codes = (await knex('plant_areas').orderBy('code').pluck('code')).join(', ');
    throw invalid(`Unknown plant area "${area}"; use one of ${codes}.`, 'area');
  }
  const mapping = await mappingOf(fields.data.mapping, upload.bytes);
  const outcome = await storeStepTest(knex, folder, { bytes: upload.bytes, originalName: upload.fileName, details: { tag, area, note, mapping }, uploadedBy: actor.email });
  if (!outcome.ok) throw invalidFile(outcome.issues, outcome.issueCount);
  const t = outcome.series.t;
  return { stepTest: publicStepTest(outcome.stepTest), rowCount: t.length, duration: t[t.length - 1] - t[0] };
}

async function mappingOf(json: string | undefined, bytes: Uint8Array): Promise<ColumnMapping> {
  if (json === undefined || json.trim() === '') {
    const read = readStepTestFile(bytes);
    if (read.issue) throw invalidFile([read.issue], 1);
    return suggestMapping(read.table);
  }
  let value: unknown;
  try {
    value = JSON.parse(json);
  } catch {
    throw invalid('The mapping field is not valid JSON; send {"time":{"column":1,"unit":"s"},"pv":{...},"co":{...}|null}.', 'mapping');
  }
  const parsed = ColumnMappingSchema.safeParse(value);
  if (!parsed.success) throw fromZod(parsed.error, 'mapping');
  return parsed.data;
}

/** A step test as the API shows it (the stored name is internal). */
export type PublicStepTest = Omit<StepTestRecord, 'storedName'>;

export function publicStepTest(s: StepTestRecord): PublicStepTest {
  const { storedName: _internal, ...rest } = s;
  return rest;
}

/** A stored fit as the API shows it. */
export interface FitView {
  id: number;
  type: ModelFitRecord['type'];
  model: ModelFitRecord['model'];
  fit: { rmse: number; r2: number };
  chosen: boolean;
  /** Published recipes closest to this model. */
  matches: RecipeMatch[];
}

/** A stored test with its thinned data, the fits made so far and their curves. */
export async function getStepTest(knex: Knex, folder: string, id: number, catalog: RecipeCatalog, loopType?: string) {
  const stepTest = await findStepTest(knex, id);
  if (!stepTest) throw missing(`There is no step test ${id}.`);
  const series = loadSeries(folder, stepTest);
  const fits = await fitsOfTest(knex, id);
  const type = loopType ?? loopTypeOfTag(stepTest.tag);
  const candidates = await catalog.published();
  return {
    stepTest: publicStepTest(stepTest),
    loopType: type,
    fits: fits.map((f) => view(f, matchRecipes(f.model, type, candidates))),
    plot: fitPlot(series, fits) as FitPlot,
  };
}

/** POST …/fits body: which models (default all three) and the loop type for matching. */
export const FitRequestSchema = z.object({
  /** Models to fit; default fopdt, sopdt and ipdt. */
  models: z.array(z.enum(MODEL_TYPES)).min(1).max(3).default([...MODEL_TYPES]),
  /** Loop type for matching recipes; default from the tag's first letter. */
  loopType: z.string().trim().min(1).max(40).optional(),
});

/** Fits the models, stores those that fit, and answers them with their curves and matches. */
export async function fitStepTest(knex: Knex, folder: string, id: number, actor: Actor, body: unknown, catalog: RecipeCatalog) {
  const request = FitRequestSchema.safeParse(body ?? {});
  if (!request.success) throw fromZod(request.error);
  const stepTest = await findStepTest(knex, id);
  if (!stepTest) throw missing(`There is no step test ${id}.`);
  const series = loadSeries(folder, stepTest);
  const results = fitSeries(series, [...new Set(request.data.models)]);
  const good = results.flatMap((r) => (r.model ? [{ model: r.model, rmse: r.fit.rmse, r2: r.fit.r2 }] : []));
  const stored = await insertFits(knex, id, good, actor.email);
  const type = request.data.loopType ?? loopTypeOfTag(stepTest.tag);
  const candidates = await catalog.published();
  return {
    stepTest: publicStepTest(stepTest),
    loopType: type,
    fits: stored.map((f) => view(f, matchRecipes(f.model, type, candidates))),
    failed: results.flatMap((r) => (r.error ? [{ type: r.type, message: r.error }] : [])),
    plot: fitPlot(series, stored),
  };
}

function view(f: ModelFitRecord, matches: RecipeMatch[]): FitView {
  return { id: f.id, type: f.type, model: f.model, fit: { rmse: f.rmse, r2: f.r2 }, chosen: f.chosen, matches };
}
