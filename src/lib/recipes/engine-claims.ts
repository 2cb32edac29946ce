import { analyze } from '../control';
import { checkRecipeClaims, claimFailures, type Analyze, type LoopClaimReport } from './claims';
import type { RecipeFrontmatter } from './frontmatter';

/** The engine's analyze, as claim checks call it (every claim check asks for a step and margins). */
export const engineAnalyze: Analyze = (request) => {
  const r = analyze(request);
  if (!r.step || !r.margins || r.stable === undefined) throw new Error('The engine answered without a step response or margins.');
  return { step: r.step as never, margins: r.margins as never, stable: r.stable };
};

/** Every loop's claims of a recipe, recomputed with the engine. */
export function recipeClaimReports(recipe: RecipeFrontmatter): LoopClaimReport[] {
  return checkRecipeClaims(recipe, engineAnalyze);
}

/**
 * Sentences naming each claim of the recipe that does not hold (empty when all hold). An engine
 * error (a model it refuses) counts as a failure too, with the engine's own message.
 */
export function brokenClaims(name: string, recipe: RecipeFrontmatter): string[] {
  try {
    return claimFailures(name, recipeClaimReports(recipe));
  } catch (err) {
    return [`Recipe "${name}": its claims could not be checked — ${err instanceof Error ? err.message : String(err)}`];
  }
}
