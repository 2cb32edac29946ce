import { z } from 'zod';
import { canSee, type Viewer } from './access';
import type { Rating, RecipeRecord } from './record';
import type { SearchIndex } from './search/index';
import { AREA_CODES, LOOP_TYPES, RECIPE_STATUSES } from './vocabulary';

/** An enum whose error lists what it accepts. */
const oneOf = <T extends readonly [string, ...string[]]>(values: T) => z.enum(values, { error: `Use one of ${values.join(', ')}.` });

/** How a list of recipes may be ordered. */
export const SORTS = ['relevance', 'title', 'reviewed', 'rating'] as const;

/** The filters of the browse page and of `GET /api/v1/recipes`; every one optional. */
export const RecipeQuerySchema = z.object({
  /** Words to search for (title, summary, tags, loop tags, body). */
  q: z.string().trim().max(200, 'Keep the search under 200 characters.').optional(),
  /** One status; absent = published only. */
  status: oneOf(RECIPE_STATUSES).optional(),
  /** One loop type. */
  loopType: oneOf(LOOP_TYPES).optional(),
  /** One process-area code. */
  area: oneOf(AREA_CODES).optional(),
  /** Only recipes rated at least this many stars on average (1–5). */
  minRating: z.coerce.number({ error: 'Give minRating as a number of stars from 1 to 5.' }).min(1, 'Give minRating as a number of stars from 1 to 5.').max(5, 'Give minRating as a number of stars from 1 to 5.').optional(),
  /** Order: relevance (with q), title, reviewed (newest first), rating (best first). */
  sort: oneOf(SORTS).optional(),
});

export type RecipeQuery = z.output<typeof RecipeQuerySchema>;

/** Reads the query string; empty values count as absent. */
export function parseRecipeQuery(params: URLSearchParams) {
  const raw = Object.fromEntries([...params.entries()].filter(([, v]) => v.trim() !== ''));
  return RecipeQuerySchema.safeParse(raw);
}

/**
 * The recipes a viewer asked for and may see, in the asked order. With words, the search index
 * ranks published and retired recipes; drafts and reviews (not indexed) match on title and summary.
 */
export function selectRecipes(
  records: RecipeRecord[],
  query: RecipeQuery,
  viewer: Viewer | null,
  context: { index: SearchIndex; ratings: Map<string, Rating> },
): RecipeRecord[] {
  const status = query.status ?? 'published';
  let list = records.filter(
    (r) =>
      r.data.status === status &&
      canSee(viewer, r) &&
      (!query.loopType || r.data.loopType === query.loopType) &&
      (!query.area || r.data.area === query.area) &&
      (query.minRating === undefined || (context.ratings.get(r.slug)?.average ?? 0) >= query.minRating),
  );
  const scores = new Map<string, number>();
  if (query.q) {
    for (const hit of context.index.search(query.q, { includeRetired: true, limit: records.length })) scores.set(hit.slug, hit.score);
    const words = query.q.toLowerCase().split(/\s+/);
    const plain = (r: RecipeRecord) => `${r.data.title} ${r.data.summary}`.toLowerCase();
    list = list.filter((r) => scores.has(r.slug) || (!['published', 'retired'].includes(r.data.status) && words.every((w) => plain(r).includes(w))));
  }
  const sort = query.sort ?? (query.q ? 'relevance' : 'title');
  const byTitle = (a: RecipeRecord, b: RecipeRecord) => a.data.title.localeCompare(b.data.title);
  const compare: Record<(typeof SORTS)[number], (a: RecipeRecord, b: RecipeRecord) => number> = {
    relevance: (a, b) => (scores.get(b.slug) ?? 0) - (scores.get(a.slug) ?? 0) || byTitle(a, b),
    title: byTitle,
    reviewed: (a, b) => b.data.reviewed.localeCompare(a.data.reviewed) || byTitle(a, b),
    rating: (a, b) => (context.ratings.get(b.slug)?.average ?? 0) - (context.ratings.get(a.slug)?.average ?? 0) || byTitle(a, b),
  };
  return [...list].sort(compare[sort]);
}
