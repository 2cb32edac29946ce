import type { APIRoute } from 'astro';
import { editorialRoute, json } from '../../../../../lib/editorial/http';
import { serverContext } from '../../../../../lib/editorial/server-context';
import { transitionRecipe } from '../../../../../lib/editorial/transitions';

/** POST /api/v1/recipes/{slug}/submit — see TRANSITIONS in src/lib/editorial/status.ts for who and from where. */
export const POST: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await transitionRecipe(serverContext(request), actor, params.slug!, 'submit')));
