import type { APIRoute } from 'astro';
import { listStepTests } from '../../../../lib/db/step-tests';
import { asRole, database, folder, noStore, readUpload } from '../../../../lib/fielddata/http';
import { publicStepTest, uploadStepTest } from '../../../../lib/fielddata/service/step-tests';

export const prerender = false;

/** GET /api/v1/step-tests (author+) → `{ stepTests }`, newest first. */
export const GET: APIRoute = (context) =>
  asRole(context, 'author', async () => Response.json({ stepTests: (await listStepTests(database())).map(publicStepTest) }, { headers: noStore }));

/**
 * POST /api/v1/step-tests (author+, multipart: `file`, `tag`, `area`?, `note`?, `mapping`? as JSON)
 * → 201 `{ stepTest, rowCount, duration }`; a bad file answers 400 `invalid_file` with `issues`.
 */
export const POST: APIRoute = (context) =>
  asRole(context, 'author', async (actor) => {
    const upload = await readUpload(context.request);
    const stored = await uploadStepTest(database(), folder(), actor, upload);
    return Response.json(stored, { status: 201, headers: { ...noStore, Location: `/api/v1/step-tests/${stored.stepTest.id}` } });
  });
