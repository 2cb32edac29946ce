import type { APIRoute } from 'astro';
import { asRole, database, readUpload, noStore } from '../../../../lib/fielddata/http';
import { liveCatalog } from '../../../../lib/fielddata/live-catalog';
import { importLoops } from '../../../../lib/fielddata/service/loops';

export const prerender = false;

/**
 * POST /api/v1/loops/import (curator+, multipart `file` or a text/csv body) → `{ created, updated }`;
 * every row must be valid, else 400 `invalid_file` with `issues` and nothing is written.
 */
export const POST: APIRoute = (context) =>
  asRole(context, 'curator', async (actor) => {
    const upload = await readUpload(context.request, 1024 * 1024, 'a loop-register file');
    const result = await importLoops(database(), upload.bytes, liveCatalog(database(), actor, context.request));
    return Response.json(result, { headers: noStore });
  });
