import type { APIRoute } from 'astro';
import { editorialRoute, json } from '../../../../../lib/editorial/http';
import { fieldNotes } from '../../../../../lib/editorial/ratings';
import { serverContext } from '../../../../../lib/editorial/server-context';

/** GET /api/v1/recipes/{slug}/notes (reader+): the rating, the caller's own rating, and the field notes. */
export const GET: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await fieldNotes(serverContext(request), actor, params.slug!)));
