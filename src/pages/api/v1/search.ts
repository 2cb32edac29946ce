import type { APIRoute } from 'astro';
import { z } from 'zod';
import { recipeSearchIndex } from '../../../lib/recipes/library';
import { badQuery, json, readerOrResponse } from '../../../lib/recipes/route-helpers';

const SearchQuerySchema = z.object({
  q: z.string({ error: 'Give the words to search for in q.' }).trim().min(1, 'Give the words to search for in q.').max(200, 'Keep the search under 200 characters.'),
});

/** GET /api/v1/search?q= → `{ hits: [{ slug, title, score }] }`, published recipes best first. */
export const GET: APIRoute = async ({ url, locals }) => {
  const { response } = readerOrResponse(locals);
  if (response) return response;
  const query = SearchQuerySchema.safeParse({ q: url.searchParams.get('q') ?? undefined });
  if (!query.success) return badQuery(query.error);
  const hits = (await recipeSearchIndex()).search(query.data.q, { limit: 50 });
  return json({ hits: hits.map((h) => ({ slug: h.slug, title: h.title, score: h.score })) });
};
