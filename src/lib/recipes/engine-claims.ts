import type { LoopClaimReport } from './claims';
import type { RecipeFrontmatter } from './frontmatter';

/** Claim reports of a recipe for its page (filled in once the engine's analyze is wired). */
export function recipeClaimReports(_recipe: RecipeFrontmatter): LoopClaimReport[] {
  return [];
}
