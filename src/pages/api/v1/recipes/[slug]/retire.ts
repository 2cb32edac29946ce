import type { APIRoute } from 'astro';
import { RetireSchema } from '../../../../../lib/editorial/fields';
import { bodyOf, editorialRoute, json } from '../../../../../lib/editorial/http';
import { serverContext } from '../../../../../lib/editorial/server-context';
import { transitionRecipe } from '../../../../../lib/editorial/transitions';

/** POST /api/v1/recipes/{slug}/retire (curator+, `{ reason, supersededBy? }`): published → retired. */
export const POST: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => {
    const input = await bodyOf(request, RetireSchema);
    return json(await transitionRecipe(serverContext(request), actor, params.slug!, 'retire', input));
  });
