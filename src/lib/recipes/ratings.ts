import { db } from '../db';
import { allRatingSummaries } from '../db/recipe-ratings';
import type { Rating } from './record';

/** No one has rated yet. */
export const NO_RATING: Rating = { average: null, count: 0 };

/** The ratings of some recipes by slug (unrated ones as NO_RATING); the one place pages and routes read them. */
export async function ratingsFor(slugs: string[]): Promise<Map<string, Rating>> {
  const all = await allRatingSummaries(db());
  return new Map(slugs.map((s) => [s, all.get(s) ?? NO_RATING]));
}
