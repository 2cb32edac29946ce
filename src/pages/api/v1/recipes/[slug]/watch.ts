import type { APIRoute } from 'astro';
import { editorialRoute, json } from '../../../../../lib/editorial/http';
import { serverContext } from '../../../../../lib/editorial/server-context';
import { setWatching, watchState } from '../../../../../lib/editorial/watching';

/** GET: whether the caller watches the recipe. PUT: start watching. DELETE: stop. Any signed-in person. */
export const GET: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await watchState(serverContext(request), actor, params.slug!)));
export const PUT: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await setWatching(serverContext(request), actor, params.slug!, true)));
export const DELETE: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await setWatching(serverContext(request), actor, params.slug!, false)));
