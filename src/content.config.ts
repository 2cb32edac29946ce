import { defineCollection, z } from 'astro:content';
import { glob } from 'astro/loaders';
import { checkRecipeEntry } from './lib/recipes/content-entry';

/**
 * The team's file recipes. The frontmatter schema is the zod 4 one in src/lib/recipes (shared
 * with the editor and the API); astro/zod only carries it across, issues and paths intact, and
 * the same step recomputes every claim with the engine so a recipe that breaks one fails the build.
 */
const recipes = defineCollection({
  loader: glob({ pattern: '**/*.mdx', base: './content/recipes' }),
  schema: z.unknown().transform((value, ctx) => checkRecipeEntry(value, ctx) ?? z.NEVER),
});

export const collections = { recipes };
