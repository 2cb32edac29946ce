import type { Rating } from './record';

/** No one has rated yet. */
export const NO_RATING: Rating = { average: null, count: 0 };

/**
 * The ratings of some recipes by slug. Ratings are kept by the editorial side's table; until it
 * exists every recipe reads as unrated, in the contract's shape. This is the one place to read them.
 */
export async function ratingsFor(slugs: string[]): Promise<Map<string, Rating>> {
  return new Map(slugs.map((s) => [s, NO_RATING]));
}
