import type { APIRoute } from 'astro';
import { TemplateSchema } from '../../../../lib/editorial/fields';
import { bodyOf, editorialRoute, json } from '../../../../lib/editorial/http';
import { serverContext } from '../../../../lib/editorial/server-context';
import { getTemplate, saveTemplate } from '../../../../lib/editorial/templates';

/** GET: one loop type's template. PUT (curator+): `{ title, body }` replaces it. */
export const GET: APIRoute = ({ params, request, locals }) => editorialRoute(locals, async () => json(await getTemplate(serverContext(request), params.loopType!)));
export const PUT: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await saveTemplate(serverContext(request), actor, params.loopType!, await bodyOf(request, TemplateSchema))));
