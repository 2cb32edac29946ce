import type { APIRoute } from 'astro';
import { SearchQuerySchema, type SearchResponse } from '../../../lib/api/schemas/search';
import { recipeSearchIndex } from '../../../lib/recipes/library';
import { badQuery, json, readerOrResponse } from '../../../lib/recipes/route-helpers';

/** GET /api/v1/search?q= → `{ hits: [{ slug, title, score }] }`, published recipes best first. */
export const GET: APIRoute = async ({ url, locals }) => {
  const { response } = readerOrResponse(locals);
  if (response) return response;
  const query = SearchQuerySchema.safeParse({ q: url.searchParams.get('q') ?? undefined });
  if (!query.success) return badQuery(query.error);
  const hits = (await recipeSearchIndex()).search(query.data.q, { limit: 50 });
  const body: SearchResponse = { hits: hits.map((h) => ({ slug: h.slug, title: h.title, score: h.score })) };
  return json(body);
};
