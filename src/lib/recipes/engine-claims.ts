import { analyze } from '../control';
import { checkRecipeClaims, claimFailures, type Analyze, type LoopClaimReport } from './claims';
import type { RecipeFrontmatter } from './frontmatter';

/** The engine's analyze, as claim checks call it (every claim check asks for a step and margins). */
export const engineAnalyze: Analyze = (request) => {
  const r = analyze(request);
  if (!r.step || !r.margins || r.stable === undefined) throw new Error('The engine answered without a step response or margins.');
  return { step: r.step as never, margins: r.margins as never, stable: r.stable };
};

/** Reports already computed in this process, by the loops' numbers (pages ask again on every view). */
const computed = new Map<string, LoopClaimReport[]>();
const KEEP = 500;

/** Every loop's claims of a recipe, recomputed with the engine (once per distinct set of numbers). */
export function recipeClaimReports(recipe: RecipeFrontmatter): LoopClaimReport[] {
  const key = JSON.stringify([recipe.model, recipe.controller, recipe.sensor, recipe.claims, recipe.tFinal, recipe.innerLoop]);
  let reports = computed.get(key);
  if (!reports) {
    reports = checkRecipeClaims(recipe, engineAnalyze);
    if (computed.size >= KEEP) computed.delete(computed.keys().next().value!);
    computed.set(key, reports);
  }
  return reports;
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
