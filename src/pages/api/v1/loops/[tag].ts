import type { APIRoute } from 'astro';
import { asRole, database, noStore, readJsonBody } from '../../../../lib/fielddata/http';
import { liveCatalog } from '../../../../lib/fielddata/live-catalog';
import { getLoop, removeLoop, replaceLoop } from '../../../../lib/fielddata/service/loops';

export const prerender = false;

/** GET /api/v1/loops/{tag} (reader+) → `{ loop, evidence }`. */
export const GET: APIRoute = (context) =>
  asRole(context, 'reader', async () => Response.json(await getLoop(database(), context.params.tag ?? ''), { headers: noStore }));

/** PUT /api/v1/loops/{tag} (author+) with the whole loop (its tag may change) → the loop. */
export const PUT: APIRoute = (context) =>
  asRole(context, 'author', async (actor) => {
    const loop = await replaceLoop(database(), context.params.tag ?? '', await readJsonBody(context.request), liveCatalog(database(), actor, context.request));
    return Response.json(loop, { headers: noStore });
  });

/** DELETE /api/v1/loops/{tag} (curator+) → 204. */
export const DELETE: APIRoute = (context) =>
  asRole(context, 'curator', async () => {
    await removeLoop(database(), context.params.tag ?? '');
    return new Response(null, { status: 204 });
  });
