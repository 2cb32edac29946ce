import { defineCollection, z } from 'astro:content';
import { glob } from 'astro/loaders';
import { RecipeFrontmatterSchema } from './lib/recipes/frontmatter';
import { bridgeParse } from './lib/recipes/zod-bridge';

/**
 * The team's file recipes. The frontmatter schema is the zod 4 one in src/lib/recipes (shared
 * with the editor and the API); astro/zod only carries it across, issues and paths intact.
 */
const recipes = defineCollection({
  loader: glob({ pattern: '**/*.mdx', base: './content/recipes' }),
  schema: z.unknown().transform((value, ctx) => bridgeParse(RecipeFrontmatterSchema, value, ctx) ?? z.NEVER),
});

export const collections = { recipes };
