import type { APIRoute } from 'astro';
import { RatingSchema } from '../../../../../lib/editorial/fields';
import { bodyOf, editorialRoute, json } from '../../../../../lib/editorial/http';
import { rateRecipe } from '../../../../../lib/editorial/ratings';
import { serverContext } from '../../../../../lib/editorial/server-context';

/** PUT /api/v1/recipes/{slug}/rating (reader+): `{ stars, note? }`, one per person → `{ rating }`. */
export const PUT: APIRoute = ({ params, request, locals }) =>
  editorialRoute(locals, async (actor) => json(await rateRecipe(serverContext(request), actor, params.slug!, await bodyOf(request, RatingSchema))));
