import type { APIRoute } from 'astro';
import { asRole, database, noStore, readJsonBody } from '../../../../lib/fielddata/http';
import { liveCatalog } from '../../../../lib/fielddata/live-catalog';
import { createLoop, queryLoops } from '../../../../lib/fielddata/service/loops';

export const prerender = false;

/** GET /api/v1/loops?area=&recipe=&tunedBefore=&tunedSince=&untuned= (reader+) → `{ loops }` by tag. */
export const GET: APIRoute = (context) =>
  asRole(context, 'reader', async () => {
    const loops = await queryLoops(database(), Object.fromEntries(context.url.searchParams));
    return Response.json({ loops }, { headers: noStore });
  });

/** POST /api/v1/loops (author+) with a loop → 201 the loop; 409 when the tag is taken. */
export const POST: APIRoute = (context) =>
  asRole(context, 'author', async (actor) => {
    const loop = await createLoop(database(), await readJsonBody(context.request), liveCatalog(database(), actor, context.request));
    return Response.json(loop, { status: 201, headers: { ...noStore, Location: `/api/v1/loops/${loop.tag}` } });
  });
