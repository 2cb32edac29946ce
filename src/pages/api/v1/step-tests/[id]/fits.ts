import type { APIRoute } from 'astro';
import { asRole, database, folder, idParam, noStore, readJsonBody } from '../../../../../lib/fielddata/http';
import { liveCatalog } from '../../../../../lib/fielddata/live-catalog';
import { fitStepTest } from '../../../../../lib/fielddata/service/step-tests';

export const prerender = false;

/**
 * POST /api/v1/step-tests/{id}/fits (author+) with `{ models?, loopType? }` (an empty body fits
 * all three) → 201 `{ fits, failed, plot, matches per fit }`.
 */
export const POST: APIRoute = (context) =>
  asRole(context, 'author', async (actor) => {
    const id = idParam(context.params.id, 'step test');
    const body = await readJsonBody(context.request, true);
    const result = await fitStepTest(database(), folder(), id, actor, body, liveCatalog(database(), actor, context.request));
    return Response.json(result, { status: 201, headers: noStore });
  });
