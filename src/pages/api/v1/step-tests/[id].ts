import type { APIRoute } from 'astro';
import { asRole, database, folder, idParam, noStore } from '../../../../lib/fielddata/http';
import { liveCatalog } from '../../../../lib/fielddata/live-catalog';
import { getStepTest } from '../../../../lib/fielddata/service/step-tests';

export const prerender = false;

/** GET /api/v1/step-tests/{id}[?loopType=] (author+) → the test, its thinned data, its fits with curves and matches. */
export const GET: APIRoute = (context) =>
  asRole(context, 'author', async (actor) => {
    const id = idParam(context.params.id, 'step test');
    const loopType = context.url.searchParams.get('loopType') || undefined;
    const result = await getStepTest(database(), folder(), id, liveCatalog(database(), actor, context.request), loopType);
    return Response.json(result, { headers: noStore });
  });
