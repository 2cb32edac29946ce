import type { APIRoute } from 'astro';
import { editorialRoute, json } from '../../../../lib/editorial/http';
import { serverContext } from '../../../../lib/editorial/server-context';
import { listTemplates } from '../../../../lib/editorial/templates';

/** GET /api/v1/templates: the starting body of a new recipe for each loop type. */
export const GET: APIRoute = ({ request, locals }) => editorialRoute(locals, async () => json({ templates: await listTemplates(serverContext(request)) }));
