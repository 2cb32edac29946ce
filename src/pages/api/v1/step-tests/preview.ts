import type { APIRoute } from 'astro';
import { asRole, noStore, readUpload } from '../../../../lib/fielddata/http';
import { previewStepTest } from '../../../../lib/fielddata/service/step-tests';

export const prerender = false;

/** POST /api/v1/step-tests/preview (author+, multipart `file`): format, first rows, suggested mapping; stores nothing. */
export const POST: APIRoute = (context) =>
  asRole(context, 'author', async () => {
    const upload = await readUpload(context.request);
    return Response.json(previewStepTest(upload.bytes), { headers: noStore });
  });
