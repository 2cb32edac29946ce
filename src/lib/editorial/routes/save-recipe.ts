import type { APIRoute } from 'astro';
import { UpdateRecipeSchema } from '../fields';
import { bodyOf, editorialRoute, json } from '../http';
import { saveRecipe } from '../save';
import { serverContext } from '../server-context';

/** PUT /api/v1/recipes/{slug} (its owner, or curator+): `{ baseRevision, ...fields }` → the recipe at its new revision. */
export const saveRecipeRoute: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await saveRecipe(serverContext(request), actor, params.slug!, await bodyOf(request, UpdateRecipeSchema))));
