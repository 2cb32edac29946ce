import { z } from 'zod';
import type { ZodOpenApiOperationObject, ZodOpenApiPathsObject } from 'zod-openapi';
import { errorResponses, jsonBody, jsonResponse } from '../openapi-parts';
import { RecipeQuerySchema } from '../../recipes/query';
import { ApiRecipeSchema } from '../../recipes/api-recipe-schema';
import { CreateRecipeSchema, RatingSchema, RetireSchema, ReturnSchema, TemplateSchema, UpdateRecipeSchema } from '../../editorial/fields';

const Slug = z.object({ slug: z.string().meta({ description: 'The recipe slug, e.g. htst-hot-water-temperature-pi.' }) });
const RatingSummary = z.object({ average: z.number().nullable(), count: z.number().int() });
const EXAMPLE_BODY = '## When to use it\n\nOn TIC-210.\n\n<LoopResponse model={{ type: "fopdt", k: 0.9, tau: 45, theta: 6 }} controller={{ form: "ideal", kc: 1.4, ti: 45 }} />\n';

/** A recipe as the editorial routes answer it (the contract's fields and a few more). */
const RecipeOut = z
  .object({
    slug: z.string(),
    title: z.string(),
    summary: z.string(),
    loopType: z.string(),
    status: z.enum(['draft', 'in_review', 'published', 'retired']),
    revision: z.number().int(),
    body: z.string(),
    model: z.unknown(),
    controller: z.unknown(),
    claims: z.array(z.unknown()),
    ownerEmail: z.string(),
    updatedAt: z.string(),
    rating: RatingSummary,
    source: z.literal('authored'),
    url: z.string(),
    retiredReason: z.string().nullable(),
    supersededBy: z.string().nullable(),
    html: z.string().meta({ description: 'The compiled, sanitized body with calculator placeholders.' }),
  })
  .meta({ id: 'AuthoredRecipe' });

const signedIn = (op: ZodOpenApiOperationObject): ZodOpenApiOperationObject => ({ tags: ['recipes'], ...op });
const transition = (summary: string, operationId: string, body?: ZodOpenApiOperationObject['requestBody']) => ({
  post: signedIn({
    operationId,
    summary,
    requestParams: { path: Slug },
    ...(body ? { requestBody: body } : {}),
    responses: { '200': jsonResponse('The recipe in its new status.', RecipeOut), ...errorResponses(400, 401, 403, 404, 409) },
  }),
});

/** The authoring, review, rating and watching routes (shared/api-v1.md, "Recipes and accounts"). */
export const editorialPaths: ZodOpenApiPathsObject = {
  '/api/v1/recipes': {
    // The read side (the recipe library) shares this route file with the editorial write side.
    get: signedIn({
      operationId: 'listRecipes',
      summary: 'Recipes from files and the editor; without `status`, published ones only (drafts and reviews only to their owner and curators).',
      requestParams: { query: RecipeQuerySchema },
      responses: { '200': jsonResponse('The recipes.', z.object({ recipes: z.array(ApiRecipeSchema) })), ...errorResponses(400, 401) },
    }),
    post: signedIn({
      operationId: 'createRecipe',
      summary: 'Create a draft (author+); its slug is made from the title, unique.',
      requestBody: jsonBody(CreateRecipeSchema, { title: 'HTST hot-water temperature, PI', summary: 'Holds the hot-water set on the HTST heating section.', loopType: 'temperature', body: EXAMPLE_BODY }),
      responses: { '201': jsonResponse('The new draft at revision 1.', RecipeOut), ...errorResponses(400, 401, 403) },
    }),
  },
  '/api/v1/recipes/{slug}': {
    get: signedIn({
      operationId: 'getRecipe',
      summary: 'One recipe, file or authored; 404 when it does not exist or you may not see it.',
      requestParams: { path: Slug },
      responses: { '200': jsonResponse('The recipe.', ApiRecipeSchema), ...errorResponses(401, 404) },
    }),
    put: signedIn({
      operationId: 'saveRecipe',
      summary: 'Save a change as a new revision (its owner, or curator+). A stale baseRevision answers 409 conflict with `current`; a refused body 400 invalid_body with the line.',
      requestParams: { path: Slug },
      requestBody: jsonBody(UpdateRecipeSchema, { baseRevision: 1, summary: 'Holds the HTST hot-water set; PI from the March bump test.', message: 'Summary from the field test' }),
      responses: { '200': jsonResponse('The recipe at its new revision.', RecipeOut), ...errorResponses(400, 401, 403, 404, 409) },
    }),
  },
  '/api/v1/recipes/{slug}/submit': transition('Submit a draft for review (its owner).', 'submitRecipe'),
  '/api/v1/recipes/{slug}/publish': transition('Publish a recipe in review (curator+); findable at once.', 'publishRecipe'),
  '/api/v1/recipes/{slug}/return': transition('Return a recipe in review to draft with comments (curator+).', 'returnRecipe', jsonBody(ReturnSchema, { comment: 'Name the valve and its size.' })),
  '/api/v1/recipes/{slug}/retire': transition('Retire a published recipe (curator+) with a reason and an optional successor.', 'retireRecipe', jsonBody(RetireSchema, { reason: 'The heat exchanger was replaced.', supersededBy: 'htst-product-temperature-cascade' })),
  '/api/v1/recipes/{slug}/rating': {
    put: signedIn({
      operationId: 'rateRecipe',
      summary: 'Rate a recipe 1–5 with an optional field note (reader+); a second call replaces the first.',
      requestParams: { path: Slug },
      requestBody: jsonBody(RatingSchema, { stars: 4, note: 'Used on TIC-214; needed ti 20 % longer because the valve sticks.' }),
      responses: { '200': jsonResponse('The new rating.', z.object({ slug: z.string(), rating: RatingSummary, mine: z.object({ stars: z.number(), note: z.string().nullable() }) })), ...errorResponses(400, 401, 404) },
    }),
  },
  '/api/v1/recipes/{slug}/notes': {
    get: signedIn({
      operationId: 'recipeFieldNotes',
      summary: 'The rating, your own rating and the field notes, newest first.',
      requestParams: { path: Slug },
      responses: { '200': jsonResponse('Field notes.', z.object({ rating: RatingSummary, notes: z.array(z.object({ name: z.string(), stars: z.number(), note: z.string(), updatedAt: z.string() })) })), ...errorResponses(401, 404) },
    }),
  },
  '/api/v1/recipes/{slug}/watch': Object.fromEntries(
    (['get', 'put', 'delete'] as const).map((m) => [m, signedIn({
      operationId: `${m}RecipeWatch`,
      summary: { get: 'Whether you watch the recipe.', put: 'Watch it: e-mail on new published revisions, retirement and field notes.', delete: 'Stop watching it.' }[m],
      requestParams: { path: Slug },
      responses: { '200': jsonResponse('Watch state.', z.object({ slug: z.string(), watching: z.boolean(), watchers: z.number().int() })), ...errorResponses(401, 404) },
    })]),
  ),
  '/api/v1/recipes/{slug}/revisions': {
    get: signedIn({
      operationId: 'recipeRevisions',
      summary: 'Every revision: who, when, message (oldest first).',
      requestParams: { path: Slug },
      responses: { '200': jsonResponse('Revisions.', z.object({ current: z.number(), revisions: z.array(z.object({ revision: z.number(), authorEmail: z.string(), createdAt: z.string(), message: z.string() })) })), ...errorResponses(401, 404, 409) },
    }),
  },
  '/api/v1/recipes/{slug}/diff': {
    get: signedIn({
      operationId: 'recipeDiff',
      summary: 'A line diff of the fields and body between two revisions.',
      requestParams: { path: Slug, query: z.object({ from: z.string(), to: z.string() }) },
      responses: { '200': jsonResponse('Runs of added, removed and unchanged lines.', z.object({ from: z.number(), to: z.number(), added: z.number(), removed: z.number(), runs: z.array(z.object({ op: z.enum(['added', 'removed', 'same']), lines: z.array(z.string()) })) })), ...errorResponses(400, 401, 404, 409) },
    }),
  },
  '/api/v1/templates': {
    get: signedIn({ operationId: 'listTemplates', summary: 'The starting body of a new recipe per loop type.', responses: { '200': jsonResponse('Templates.', z.object({ templates: z.array(z.object({ loopType: z.string(), title: z.string(), body: z.string() })) })), ...errorResponses(401) } }),
  },
  '/api/v1/templates/{loopType}': {
    get: signedIn({ operationId: 'getTemplate', summary: "One loop type's template.", requestParams: { path: z.object({ loopType: z.string() }) }, responses: { '200': jsonResponse('The template.', z.object({ loopType: z.string(), title: z.string(), body: z.string() })), ...errorResponses(401, 404) } }),
    put: signedIn({ operationId: 'saveTemplate', summary: 'Replace a template (curator+); its body passes the recipe-body checks.', requestParams: { path: z.object({ loopType: z.string() }) }, requestBody: jsonBody(TemplateSchema, { title: 'Flow loop recipe', body: '## When to use it\n\nFast flow loops.\n' }), responses: { '200': jsonResponse('The template.', z.object({ loopType: z.string(), title: z.string(), body: z.string() })), ...errorResponses(400, 401, 403, 404) } }),
  },
  '/api/v1/review-queue': {
    get: signedIn({ operationId: 'reviewQueue', summary: 'What waits for review, and which published recipes are stale (curator+).', responses: { '200': jsonResponse('The queue.', z.object({ waiting: z.array(z.unknown()), stale: z.array(z.unknown()), staleDays: z.number() })), ...errorResponses(401, 403) } }),
  },
  '/api/v1/audit-log': {
    get: signedIn({ operationId: 'auditLog', summary: 'Every editorial state change, newest first, 100 a page (admin).', requestParams: { query: z.object({ before: z.string().optional(), slug: z.string().optional() }) }, responses: { '200': jsonResponse('Entries.', z.object({ entries: z.array(z.unknown()), next: z.number().nullable() })), ...errorResponses(401, 403) } }),
  },
  '/api/v1/preview': {
    post: signedIn({
      operationId: 'previewBody',
      summary: 'Compile a body as a save would (author+): HTML, or the problems with line and column.',
      requestBody: jsonBody(z.object({ body: z.string() }), { body: EXAMPLE_BODY }),
      responses: { '200': jsonResponse('The compiled body or its problems.', z.union([z.object({ ok: z.literal(true), html: z.string() }), z.object({ ok: z.literal(false), problems: z.array(z.object({ line: z.number(), column: z.number(), reason: z.string() })) })])), ...errorResponses(400, 401, 403) },
    }),
  },
};
