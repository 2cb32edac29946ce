import type { APIRoute } from 'astro';
import { notFound } from '../../../../lib/api/errors';
import { canSee } from '../../../../lib/recipes/access';
import { toApiRecipe } from '../../../../lib/recipes/api-recipe';
import { findRecipe } from '../../../../lib/recipes/library';
import { ratingsFor } from '../../../../lib/recipes/ratings';
import { json, readerOrResponse } from '../../../../lib/recipes/route-helpers';

/** GET /api/v1/recipes/{slug}: the recipe; 404 when it does not exist or the viewer may not see it. */
export const GET: APIRoute = async ({ params, locals }) => {
  const { viewer, response } = readerOrResponse(locals);
  if (response) return response;
  const record = params.slug ? await findRecipe(params.slug) : null;
  if (!record || !canSee(viewer, record)) {
    return notFound(`No recipe "${params.slug}" that you may read; find recipes with GET /api/v1/recipes.`);
  }
  const ratings = await ratingsFor([record.slug]);
  return json(toApiRecipe(record, ratings.get(record.slug)!));
};

import { saveRecipeRoute } from '../../../../lib/editorial/routes/save-recipe';

/** PUT /api/v1/recipes/{slug} (its owner, or curator+): save a revision (src/lib/editorial/save.ts). */
export const PUT = saveRecipeRoute;
