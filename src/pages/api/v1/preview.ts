import type { APIRoute } from 'astro';
import { z } from 'zod';
import { atLeast } from '../../../lib/editorial/actor';
import { forbidden } from '../../../lib/editorial/errors';
import { bodyOf, editorialRoute, json } from '../../../lib/editorial/http';
import { BODY_LIMITS, compileBodyIsolated } from '../../../lib/recipes/authored-mdx';

const PreviewSchema = z.object({ body: z.string().max(BODY_LIMITS.maxBytes, `The body is limited to ${BODY_LIMITS.maxBytes / 1024} KB.`) });

/**
 * POST /api/v1/preview (author+): `{ body }` → `{ ok: true, html, islands }` or
 * `{ ok: false, problems: [{ line, column, reason }] }` — the editor's live preview, compiled
 * exactly as a save would be. A refused body is an answer here (200), not an error.
 */
export const POST: APIRoute = ({ request, locals }) =>
  editorialRoute(locals, async (actor) => {
    if (!atLeast(actor, 'author')) throw forbidden('Previews are for authors, curators and admins.');
    const { body } = await bodyOf(request, PreviewSchema);
    return json(await compileBodyIsolated(body));
  });
