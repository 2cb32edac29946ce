import type { APIRoute } from 'astro';
import { evidenceOfRecipe } from '../../../../lib/db/evidence';
import { asRole, database, noStore, readJsonBody } from '../../../../lib/fielddata/http';
import { liveCatalog } from '../../../../lib/fielddata/live-catalog';
import { invalid } from '../../../../lib/fielddata/problem';
import { saveEvidence } from '../../../../lib/fielddata/service/evidence';

export const prerender = false;

/** GET /api/v1/evidence?recipe=slug (reader+) → `{ evidence }` behind a recipe, newest first. */
export const GET: APIRoute = (context) =>
  asRole(context, 'reader', async (actor) => {
    const slug = context.url.searchParams.get('recipe');
    if (!slug) throw invalid('Name the recipe: /api/v1/evidence?recipe=its-slug.', 'recipe');
    if (!(await liveCatalog(database(), actor, context.request).find(slug))) return Response.json({ evidence: [] }, { headers: noStore });
    return Response.json({ evidence: await evidenceOfRecipe(database(), slug) }, { headers: noStore });
  });

/**
 * POST /api/v1/evidence (author+) with `{ stepTestId, fitId, tuning, note?, recipeSlug | newDraft, loopTags? }`
 * → 201 `{ evidence, recipe, createdDraft }`.
 */
export const POST: APIRoute = (context) =>
  asRole(context, 'author', async (actor) => {
    const body = await readJsonBody(context.request);
    const saved = await saveEvidence(database(), actor, body, liveCatalog(database(), actor, context.request));
    return Response.json(saved, { status: 201, headers: noStore });
  });
