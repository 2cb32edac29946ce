import type { APIRoute } from 'astro';
import { revisionHistory } from '../../../../../lib/editorial/history';
import { editorialRoute, json } from '../../../../../lib/editorial/http';
import { serverContext } from '../../../../../lib/editorial/server-context';

/** GET /api/v1/recipes/{slug}/revisions: every revision (who, when, message), oldest first. */
export const GET: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await revisionHistory(serverContext(request), actor, params.slug!)));
