import { brokenClaims } from './engine-claims';
import { RecipeFrontmatterSchema, type RecipeFrontmatter } from './frontmatter';
import { bridgeParse, type Zod3Context } from './zod-bridge';

/**
 * The content collection's check of one recipe file: the shared frontmatter schema, then every
 * claim recomputed by the engine. Each problem becomes an issue, so `astro build` (and `astro
 * dev`) stop with the recipe's name and the broken claim. Returns null when anything failed.
 */
export function checkRecipeEntry(value: unknown, ctx: Zod3Context): RecipeFrontmatter | null {
  const data = bridgeParse(RecipeFrontmatterSchema, value, ctx);
  if (!data) return null;
  const broken = brokenClaims(data.title, data);
  for (const message of broken) ctx.addIssue({ code: 'custom', message, path: ['claims'] });
  return broken.length ? null : data;
}
