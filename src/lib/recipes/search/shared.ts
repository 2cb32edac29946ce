import type { RecipeRecord } from '../record';
import { createSearchIndex, type SearchIndex } from './index';

let current: Promise<SearchIndex> | undefined;

/** The process's one search index, built from `load` on first use and then kept up to date. */
export function sharedSearchIndex(load: () => Promise<RecipeRecord[]>): Promise<SearchIndex> {
  current ??= load().then((records) => createSearchIndex(records));
  return current;
}

/**
 * Call after a recipe is saved, published or retired: it is findable (or gone) as soon as this
 * returns. Before the index is first built there is nothing to update: the build reads everything.
 */
export async function addOrReplace(record: RecipeRecord): Promise<void> {
  (await current)?.addOrReplace(record);
}

/** Call after a recipe is deleted. */
export async function remove(slug: string): Promise<void> {
  (await current)?.remove(slug);
}
