import { z } from 'zod';
import type { ZodOpenApiOperationObject, ZodOpenApiPathsObject } from 'zod-openapi';
import { errorResponses, jsonBody, jsonResponse } from '../openapi-parts';
import { ColumnMappingSchema } from '../../fielddata/csv/mapping';
import { FitRequestSchema } from '../../fielddata/service/step-tests';
import { LoopQuerySchema } from '../../fielddata/service/loops';
import { EvidenceRequestSchema } from '../../schemas/evidence';
import { LoopInputSchema } from '../../schemas/loop';

/**
 * Field data: step tests, fits, evidence and the loop register (sessions needed; roles as listed).
 * A refused file answers 400 `invalid_file` with, beside `error`, `issues` (every bad row or cell,
 * `{ line, column, message }`, the first 100) and `issueCount`.
 */

const ModelSchema = z.looseObject({ type: z.enum(['fopdt', 'sopdt', 'ipdt']), k: z.number(), theta: z.number() });
const IssueSchema = z.object({ line: z.number().nullable(), column: z.number().nullable(), message: z.string() });
const StepTestSchema = z
  .looseObject({ id: z.number(), tag: z.string(), area: z.string().nullable(), rowCount: z.number(), mapping: ColumnMappingSchema, uploadedBy: z.string(), uploadedAt: z.string() })
  .meta({ id: 'StepTest' });
const FitSchema = z
  .looseObject({ id: z.number(), type: z.string(), model: ModelSchema, fit: z.object({ rmse: z.number(), r2: z.number() }), chosen: z.boolean(), matches: z.array(z.looseObject({ slug: z.string(), distance: z.number() })) })
  .meta({ id: 'ModelFit' });
const FitAnswerSchema = z.looseObject({ stepTest: StepTestSchema, loopType: z.string(), fits: z.array(FitSchema), plot: z.looseObject({ t: z.array(z.number()), pv: z.array(z.number()) }) });
const LoopSchema = LoopInputSchema.extend({ id: z.number(), evidenceIds: z.array(z.number()), createdAt: z.string(), updatedAt: z.string() }).meta({ id: 'Loop' });
const EvidenceSchema = z.looseObject({ id: z.number(), recipeSlug: z.string(), stepTestId: z.number(), fitId: z.number(), model: ModelSchema, tag: z.string() }).meta({ id: 'Evidence' });

const CSV_EXAMPLE = 'Time [s];TIC-210.PV [°C];TIC-210.OUT [%]\n0;71,80;40\n1;71,81;40\n2;71,79;44\n';
const LOOP_EXAMPLE = {
  tag: 'TIC-210', area: 'htst', description: 'HTST product outlet temperature', recipeSlug: 'htst-product-temperature-cascade',
  tuning: { form: 'ideal', gain: 1.9, integral: 38, derivative: null, timeUnit: 's', gainUnit: '%/°C' },
  commissionedBy: 'Hanne Vos', commissionedAt: '2026-02-10', ownerEmail: 'hanne.vos@brindlewood.example',
};
const EVIDENCE_EXAMPLE = {
  stepTestId: 12, fitId: 31, recipeSlug: 'htst-product-temperature-cascade', note: 'After the plate-pack rework', loopTags: ['TIC-210'],
  tuning: { rule: 'simc', source: 'Skogestad (2003)', setting: { form: 'ideal', gain: 1.7, integral: 21.8, derivative: null, timeUnit: 's', gainUnit: '%/°C' } },
};

/** A CSV upload: multipart with a `file` part and text fields, or the CSV itself as text/csv. */
const multipart = (fields: Record<string, z.ZodType>, example: Record<string, string>): NonNullable<ZodOpenApiOperationObject['requestBody']> => ({
  required: true,
  content: {
    'multipart/form-data': { schema: z.object({ file: z.string().meta({ format: 'binary', description: 'The CSV file.' }), ...fields }), example: { file: CSV_EXAMPLE, ...example } },
    'text/csv': { schema: z.string(), example: CSV_EXAMPLE },
  },
});

function op(operationId: string, summary: string, extra: Partial<ZodOpenApiOperationObject>, ok: [string, string, z.ZodType], ...errors: number[]): ZodOpenApiOperationObject {
  return { operationId, summary, tags: ['field data'], ...extra, responses: { [ok[0]]: jsonResponse(ok[1], ok[2]), ...errorResponses(401, 403, ...errors) } };
}

const tagParam = { path: z.object({ tag: z.string().meta({ description: 'ISA-5.1 tag, e.g. TIC-210.' }) }) };
const idParam = { path: z.object({ id: z.string().meta({ description: 'Step-test id.' }) }) };

export const fieldDataPaths: ZodOpenApiPathsObject = {
  '/api/v1/step-tests/preview': {
    post: op('previewStepTest', 'Reads a step-test CSV (author+): format, first rows, suggested mapping; stores nothing.', { requestBody: multipart({}, {}) },
      ['200', 'What was read.', z.looseObject({ columns: z.number(), rowCount: z.number(), suggestedMapping: ColumnMappingSchema, issues: z.array(IssueSchema) })], 400, 413),
  },
  '/api/v1/step-tests': {
    get: op('listStepTests', 'Uploaded step tests, newest first (author+).', {}, ['200', 'The tests.', z.object({ stepTests: z.array(StepTestSchema) })]),
    post: op('uploadStepTest', 'Stores a step test (author+); all or nothing, every bad row reported by line.', {
      requestBody: multipart(
        { tag: z.string(), area: z.string().optional(), note: z.string().optional(), mapping: z.string().optional().meta({ description: 'ColumnMapping as JSON.' }) },
        { tag: 'TIC-210', area: 'htst', mapping: '{"time":{"column":1,"unit":"s"},"pv":{"column":2,"unit":"°C"},"co":{"column":3,"unit":"%"}}' },
      ),
    }, ['201', 'Stored.', z.looseObject({ stepTest: StepTestSchema, rowCount: z.number(), duration: z.number() })], 400, 413),
  },
  '/api/v1/step-tests/{id}': {
    get: op('getStepTest', 'A stored step test with its thinned data, fits, curves and matching recipes (author+).', { requestParams: idParam }, ['200', 'The test.', FitAnswerSchema], 404),
  },
  '/api/v1/step-tests/{id}/fits': {
    post: op('fitStepTest', 'Fits FOPDT, SOPDT and IPDT (author+) and ranks published recipes by model distance.', { requestParams: idParam, requestBody: jsonBody(FitRequestSchema, { models: ['fopdt', 'sopdt', 'ipdt'] }) },
      ['201', 'The fits.', FitAnswerSchema], 400, 404),
  },
  '/api/v1/evidence': {
    get: op('listEvidence', 'Evidence behind a recipe (reader+).', { requestParams: { query: z.object({ recipe: z.string() }) } }, ['200', 'The evidence.', z.object({ evidence: z.array(EvidenceSchema) })], 400),
    post: op('saveEvidence', 'Saves a step test, its chosen fit and tuning as evidence for a recipe or a new draft (author+).', { requestBody: jsonBody(EvidenceRequestSchema, EVIDENCE_EXAMPLE) },
      ['201', 'Saved.', z.looseObject({ evidence: EvidenceSchema, recipe: z.looseObject({ slug: z.string(), url: z.string() }), createdDraft: z.boolean() })], 400, 409),
  },
  '/api/v1/loops': {
    get: op('listLoops', 'The loop register, filtered (reader+).', { requestParams: { query: LoopQuerySchema } }, ['200', 'The loops by tag.', z.object({ loops: z.array(LoopSchema) })], 400),
    post: op('createLoop', 'Registers a loop (author+).', { requestBody: jsonBody(LoopInputSchema, LOOP_EXAMPLE) }, ['201', 'The loop.', LoopSchema], 400, 409),
  },
  '/api/v1/loops/{tag}': {
    get: op('getLoop', 'A loop with its evidence (reader+).', { requestParams: tagParam }, ['200', 'The loop.', z.object({ loop: LoopSchema, evidence: z.array(EvidenceSchema) })], 404),
    put: op('replaceLoop', 'Replaces a loop entry (author+).', { requestParams: tagParam, requestBody: jsonBody(LoopInputSchema, LOOP_EXAMPLE) }, ['200', 'The loop.', LoopSchema], 400, 404, 409),
    delete: { operationId: 'deleteLoop', summary: 'Removes a loop (curator+).', tags: ['field data'], requestParams: tagParam, responses: { '204': { description: 'Removed.' }, ...errorResponses(401, 403, 404) } },
  },
  '/api/v1/loops/export.csv': {
    get: { operationId: 'exportLoops', summary: 'The register as CSV (reader+, same filters as the list).', tags: ['field data'], requestParams: { query: LoopQuerySchema },
      responses: { '200': { description: 'CSV with a header row.', content: { 'text/csv': { schema: z.string() } } }, ...errorResponses(400, 401) } },
  },
  '/api/v1/loops/import': {
    post: op('importLoops', 'Imports a register CSV (curator+); every row valid or nothing written.', {
      requestBody: {
        required: true,
        content: {
          'multipart/form-data': { schema: z.object({ file: z.string().meta({ format: 'binary' }) }), example: { file: 'tag,area,owner_email\nTIC-210,htst,hanne.vos@brindlewood.example\n' } },
          'text/csv': { schema: z.string(), example: 'tag,area,owner_email\nTIC-210,htst,hanne.vos@brindlewood.example\n' },
        },
      },
    },
      ['200', 'What changed.', z.object({ created: z.array(z.string()), updated: z.array(z.string()) })], 400, 413),
  },
};


