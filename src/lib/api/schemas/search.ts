import { z } from 'zod';

const Q_MESSAGE = 'Give the words to search for in q.';

/** The query string of GET /api/v1/search. */
export const SearchQuerySchema = z
  .object({
    /** Words to find in title, summary, tags, loop tags and body; by their start and with typos forgiven. */
    q: z
      .string({ error: Q_MESSAGE })
      .trim()
      .min(1, Q_MESSAGE)
      .max(200, 'Keep the search under 200 characters.')
      .meta({ description: 'Words to find (1–200 characters); a word matches by its start, and with a typo or two when it finds nothing as written.', example: 'pasteurizer cascade' }),
  })
  .meta({ id: 'SearchQuery' });

export type SearchQuery = z.output<typeof SearchQuerySchema>;

/** One hit of the search. */
export const SearchHitSchema = z
  .object({
    /** The recipe's slug; its page is /recipes/{slug}. */
    slug: z.string(),
    /** The recipe's title. */
    title: z.string(),
    /** Relevance (BM25 with field boosts; larger is better, only comparable within one answer). */
    score: z.number(),
  })
  .meta({ id: 'SearchHit' });

/** The answer of GET /api/v1/search: published recipes, best first, at most 50. */
export const SearchResponseSchema = z
  .object({ hits: z.array(SearchHitSchema).max(50) })
  .meta({ id: 'SearchResponse' });

export type SearchResponse = z.output<typeof SearchResponseSchema>;
