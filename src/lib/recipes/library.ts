import { getCollection } from 'astro:content';
import { fileRecord, type RecipeRecord } from './record';
import { sharedSearchIndex } from './search/shared';
import { db } from '../db';
import { authoredRecords } from '../editorial/records';

let files: Promise<RecipeRecord[]> | undefined;

/** The file recipes of the content collection; read once per process (they change only with a build). */
function fileRecipes(): Promise<RecipeRecord[]> {
  files ??= getCollection('recipes').then((entries) => entries.map((e) => fileRecord(e.id, e.data, e.body ?? '')));
  return files;
}

/**
 * Every recipe the app knows, from every source, in one list (server side only). Authored
 * recipes from the database join here as a second source.
 */
export async function allRecipes(): Promise<RecipeRecord[]> {
  const sources = await Promise.all([fileRecipes(), authoredRecords(db())]);
  return sources.flat();
}

/** One recipe by slug, or null. */
export async function findRecipe(slug: string): Promise<RecipeRecord | null> {
  return (await allRecipes()).find((r) => r.slug === slug) ?? null;
}

/** The process's search index over all recipes (built on first use). */
export function recipeSearchIndex() {
  return sharedSearchIndex(allRecipes);
}
