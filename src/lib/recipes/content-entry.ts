import { chainMismatches } from './chain-check';
import { brokenClaims } from './engine-claims';
import { RecipeFrontmatterSchema, type RecipeFrontmatter } from './frontmatter';
import { bridgeParse, type Zod3Context } from './zod-bridge';

/**
 * The content collection's check of one recipe file: the shared frontmatter schema, the blocks
 * of its chain (when listed) against its model, then every claim recomputed by the engine. Each problem becomes an issue, so `astro build` (and `astro
 * dev`) stop with the recipe's name and the broken claim. Returns null when anything failed.
 */
export function checkRecipeEntry(value: unknown, ctx: Zod3Context): RecipeFrontmatter | null {
  const data = bridgeParse(RecipeFrontmatterSchema, value, ctx);
  if (!data) return null;
  const broken = [...chainMismatches(data.title, data).map((message) => ({ message, path: ['chain'] })), ...brokenClaims(data.title, data).map((message) => ({ message, path: ['claims'] }))];
  for (const { message, path } of broken) ctx.addIssue({ code: 'custom', message, path });
  return broken.length ? null : data;
}
