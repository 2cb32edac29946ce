import type { APIRoute } from 'astro';
import { createRecipe } from '../create';
import { CreateRecipeSchema } from '../fields';
import { bodyOf, editorialRoute, json } from '../http';
import { serverContext } from '../server-context';

/** POST /api/v1/recipes (author+): a new draft; 201 with the recipe, its slug made from the title. */
export const createRecipeRoute: APIRoute = ({ request, locals }) =>
  editorialRoute(locals, async (actor) => json(await createRecipe(serverContext(request), actor, await bodyOf(request, CreateRecipeSchema)), 201));
