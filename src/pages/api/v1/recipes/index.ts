import type { APIRoute } from 'astro';
import { toApiRecipe } from '../../../../lib/recipes/api-recipe';
import { allRecipes, recipeSearchIndex } from '../../../../lib/recipes/library';
import { parseRecipeQuery, selectRecipes } from '../../../../lib/recipes/query';
import { ratingsFor } from '../../../../lib/recipes/ratings';
import { badQuery, json, readerOrResponse } from '../../../../lib/recipes/route-helpers';

/** GET /api/v1/recipes?q=&status=&loopType= (also area, minRating, sort): `{ recipes: [...] }`. */
export const GET: APIRoute = async ({ url, locals }) => {
  const { viewer, response } = readerOrResponse(locals);
  if (response) return response;
  const query = parseRecipeQuery(url.searchParams);
  if (!query.success) return badQuery(query.error);
  const records = await allRecipes();
  const ratings = await ratingsFor(records.map((r) => r.slug));
  const chosen = selectRecipes(records, query.data, viewer, { index: await recipeSearchIndex(), ratings });
  return json({ recipes: chosen.map((r) => toApiRecipe(r, ratings.get(r.slug)!)) });
};

import { createRecipeRoute } from '../../../../lib/editorial/routes/create-recipe';

/** POST /api/v1/recipes (author+): create a draft (src/lib/editorial/create.ts). */
export const POST = createRecipeRoute;
