/**
 * "This loop behaves like recipe X": ranks recipes by how close their process model is to a
 * fitted one. Recipes of the same loop type come first; within each group, by the distance d:
 *
 * Both self-regulating (FOPDT, or SOPDT reduced to FOPDT by Skogestad's half rule:
 * τ = τ1 + τ2/2, θ = θ + τ2/2 — Skogestad 2003, J. Process Control 13:291–309):
 *     d = |ln(|k1|/|k2|)| + |ln(τ1/τ2)| + 2·|θ1/τ1 − θ2/τ2|
 * Both integrating (IPDT, k the slope gain in 1/s):
 *     d = |ln(|k1|/|k2|)| + |ln(θ1'/θ2')|,  θ' = max(θ, 0.1 s)
 * One of each: the self-regulating model is read as an integrator of slope k/τ (its early
 * response when τ ≫ θ) and 1 is added for the change of class.
 * Gains of opposite sign (direct vs reverse acting) add 3.
 *
 * Why these terms: a factor e (≈ 2.7) in gain or time constant counts 1, the same as a change of
 * 0.5 in θ/τ, which is what mostly decides how hard a loop is to control (common practice, not
 * from a publication). Recipes whose model is a general transfer function are not ranked.
 */
import type { ProcessModel } from '../control/types';

/** A recipe as matching needs it. */
export interface MatchCandidate {
  slug: string;
  title: string;
  loopType: string;
  /** The recipe's model; anything that is not fopdt/sopdt/ipdt is skipped. */
  model: { type: string; [key: string]: unknown } | null;
}

/** One ranked recipe, with the parts of its distance. */
export interface RecipeMatch {
  slug: string;
  title: string;
  loopType: string;
  sameLoopType: boolean;
  /** The total distance d (0 = the same model). */
  distance: number;
  parts: { gain: number; time: number; deadTimeRatio: number; penalty: number };
}

const LOW_ORDER = new Set(['fopdt', 'sopdt', 'ipdt']);
const THETA_FLOOR = 0.1;

type Reduced = { integrating: false; k: number; tau: number; theta: number } | { integrating: true; k: number; theta: number };

/** FOPDT parameters of a low-order model (half rule for SOPDT), or its integrator slope. */
export function reduce(model: ProcessModel): Reduced {
  if (model.type === 'ipdt') return { integrating: true, k: model.k, theta: model.theta };
  if (model.type === 'fopdt') return { integrating: false, k: model.k, tau: model.tau, theta: model.theta };
  return { integrating: false, k: model.k, tau: model.tau1 + model.tau2 / 2, theta: model.theta + model.tau2 / 2 };
}

/** The distance between two low-order models, with its parts (see the module comment). */
export function modelDistance(a: ProcessModel, b: ProcessModel): RecipeMatch['parts'] & { total: number } {
  const ra = reduce(a);
  const rb = reduce(b);
  const signPenalty = Math.sign(ra.k) === Math.sign(rb.k) ? 0 : 3;
  if (!ra.integrating && !rb.integrating) {
    const gain = Math.abs(Math.log(Math.abs(ra.k) / Math.abs(rb.k)));
    const time = Math.abs(Math.log(ra.tau / rb.tau));
    const deadTimeRatio = 2 * Math.abs(ra.theta / ra.tau - rb.theta / rb.tau);
    return { gain, time, deadTimeRatio, penalty: signPenalty, total: gain + time + deadTimeRatio + signPenalty };
  }
  const slope = (r: Reduced) => (r.integrating ? r.k : r.k / r.tau);
  const gain = Math.abs(Math.log(Math.abs(slope(ra)) / Math.abs(slope(rb))));
  const time = Math.abs(Math.log(Math.max(ra.theta, THETA_FLOOR) / Math.max(rb.theta, THETA_FLOOR)));
  const penalty = signPenalty + (ra.integrating === rb.integrating ? 0 : 1);
  return { gain, time, deadTimeRatio: 0, penalty, total: gain + time + penalty };
}

/** Recipes ranked for a fitted model: same loop type first, then by distance; at most `limit`. */
export function matchRecipes(
  fitted: ProcessModel,
  loopType: string | null,
  candidates: MatchCandidate[],
  limit = 5,
): RecipeMatch[] {
  const ranked: RecipeMatch[] = [];
  for (const c of candidates) {
    if (!c.model || !LOW_ORDER.has(c.model.type) || !validLowOrder(c.model)) continue;
    const { total, ...parts } = modelDistance(fitted, c.model as ProcessModel);
    ranked.push({ slug: c.slug, title: c.title, loopType: c.loopType, sameLoopType: c.loopType === loopType, distance: total, parts });
  }
  ranked.sort((a, b) => Number(b.sameLoopType) - Number(a.sameLoopType) || a.distance - b.distance || a.slug.localeCompare(b.slug));
  return ranked.slice(0, limit);
}

function validLowOrder(m: Record<string, unknown>): boolean {
  const pos = (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v > 0;
  const nonNeg = (v: unknown) => typeof v === 'number' && Number.isFinite(v) && v >= 0;
  const gain = typeof m.k === 'number' && Number.isFinite(m.k) && m.k !== 0;
  if (!gain || !nonNeg(m.theta)) return false;
  if (m.type === 'fopdt') return pos(m.tau);
  if (m.type === 'sopdt') return pos(m.tau1) && nonNeg(m.tau2);
  return true;
}
