import type { Claim } from '../schemas';
import type { RecipeFrontmatter } from './frontmatter';
import type { CheckedLoopSchema } from './schema';
import type { z } from 'zod';
import { claimLabel, formatFigure, METRIC_LABELS } from './claim-label';
import { holds, MARGIN_METRICS, metricValue, type LoopFigures } from './claim-metrics';
import { plantOf } from './plant';

type CheckedLoop = z.output<typeof CheckedLoopSchema>;

/** The contract's analyze request, as far as claim checks use it. */
export interface ClaimAnalyzeRequest {
  plant: { num: number[]; den: number[]; delay: number };
  sensor?: { num: number[]; den: number[]; delay?: number };
  controller: CheckedLoop['controller'];
  analyses: { step: { input: Claim['input']; tFinal?: number; points: number }; margins: true; poles: true };
}

/** The engine's analyze (src/lib/control), passed in so this module stays free of it. */
export type Analyze = (request: ClaimAnalyzeRequest) => LoopFigures;

/** One claim and what the engine computed for it. */
export interface ClaimResult {
  claim: Claim;
  label: string;
  /** The computed figure (Infinity for an infinite gain margin; null where the engine has none). */
  value: number | null;
  /** The computed figure as text, with its unit. */
  shown: string;
  holds: boolean;
}

/** The claims of one loop (the main loop or a cascade's inner loop). */
export interface LoopClaimReport {
  loop: 'main' | 'inner';
  stable: boolean;
  results: ClaimResult[];
}

/** Samples of each claim-check step response; fine enough for 2 % settling on any horizon. */
const STEP_POINTS = 4001;

/** Recomputes every claim of one loop with the engine. An unstable loop fails all its claims. */
export function checkLoopClaims(loop: CheckedLoop, analyze: Analyze, which: LoopClaimReport['loop'] = 'main'): LoopClaimReport {
  const figures = new Map<Claim['input'], LoopFigures>();
  const figuresFor = (input: Claim['input']) => {
    let f = figures.get(input);
    if (!f) {
      f = analyze({
        plant: plantOf(loop.model),
        ...(loop.sensor ? { sensor: loop.sensor } : {}),
        controller: loop.controller,
        analyses: { step: { input, points: STEP_POINTS, ...(loop.tFinal ? { tFinal: loop.tFinal } : {}) }, margins: true, poles: true },
      });
      figures.set(input, f);
    }
    return f;
  };
  const setpoint = figuresFor('setpoint');
  const results = loop.claims.map((claim): ClaimResult => {
    const f = MARGIN_METRICS.has(claim.metric) ? setpoint : figuresFor(claim.input);
    const value = f.stable ? metricValue(claim, f) : null;
    return { claim, label: claimLabel(claim), value, shown: formatFigure(value, METRIC_LABELS[claim.metric].unit), holds: f.stable && holds(claim, value) };
  });
  return { loop: which, stable: setpoint.stable, results };
}

/** Every loop of a recipe, main loop first. */
export function checkRecipeClaims(recipe: RecipeFrontmatter, analyze: Analyze): LoopClaimReport[] {
  const reports = [checkLoopClaims(recipe, analyze, 'main')];
  if (recipe.innerLoop) reports.push(checkLoopClaims(recipe.innerLoop, analyze, 'inner'));
  return reports;
}

/** One sentence per claim that does not hold, naming the recipe, the loop and the figure. */
export function claimFailures(name: string, reports: LoopClaimReport[]): string[] {
  return reports.flatMap((r) => {
    const where = r.loop === 'inner' ? 'inner loop' : 'loop';
    const unstable = r.stable ? [] : [`Recipe "${name}": the ${where} is unstable with the stated controller.`];
    const broken = r.results
      .filter((x) => !x.holds && r.stable)
      .map((x) => `Recipe "${name}": ${where} claim "${x.label}" does not hold — the engine computes ${x.shown}.`);
    return [...unstable, ...broken];
  });
}
