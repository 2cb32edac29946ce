import type { APIRoute } from 'astro';
import { ReturnSchema } from '../../../../../lib/editorial/fields';
import { bodyOf, editorialRoute, json } from '../../../../../lib/editorial/http';
import { serverContext } from '../../../../../lib/editorial/server-context';
import { transitionRecipe } from '../../../../../lib/editorial/transitions';

/** POST /api/v1/recipes/{slug}/return (curator+, `{ comment }`): in_review → draft, the comment mailed to the owner. */
export const POST: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => {
    const input = await bodyOf(request, ReturnSchema);
    return json(await transitionRecipe(serverContext(request), actor, params.slug!, 'return', input));
  });
