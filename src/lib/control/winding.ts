/**
 * Change of arg(1 + L(jw)) along a stretch [a, b] of the imaginary axis, L with exact dead time,
 * at a cost that does not grow with the dead time. The delay turns L by −w·θ, possibly millions
 * of turns, but only whether |L| is above or below 1 decides how those turns wind 1 + L:
 * - where |L| < 1 throughout, 1 + L stays in the right half plane, so its argument is the
 *   principal one at each end;
 * - where |L| > 1 throughout, 1 + L = L·(1 + 1/L) with 1 + 1/L in the right half plane, so the
 *   change is that of the continuous phase of L (exact, delay included) plus the principal
 *   argument of 1 + 1/L at each end.
 * So [a, b] is cut where |L| = |L_R| crosses 1 (Brent on log|L|), and between cuts the ends
 * suffice. |L| is smooth on the time scales of the rational part only; the grid is the shared
 * scan (every root frequency, 16 points per decade) and is refined where the phase of the
 * rational part turns more than 30° between points.
 */
import { type FactoredModel, pointInto } from './frequency';
import { bisectLog, type LoopScan } from './scan-grid';
import { MAX_TURN_REFINEMENTS, ModelBudget } from './budget';

interface Sample {
  w: number;
  mag: number;
  /** Continuous phase of the rational part L_R, rad. */
  rational: number;
  /** Continuous phase of L, rad, dead time included. */
  phi: number;
}

const MAX_RATIONAL_TURN = Math.PI / 6;
const PER_DECADE = 16;
/** Largest w·θ (rad) at which a scan value's phase is reused for the rational part. */
const REUSE_TURNS = 1e6;

/** arg(1 + L) on the branch that is continuous while |L| stays on the given side of 1. */
function branchArg(s: Sample, outside: boolean): number {
  const c = Math.cos(s.phi), si = Math.sin(s.phi);
  if (outside) {
    // 1 + 1/L = 1 + e^(−jφ)/|L|
    return s.phi + Math.atan2(-si / s.mag, 1 + c / s.mag);
  }
  return Math.atan2(s.mag * si, 1 + s.mag * c);
}

function emptySample(): Sample {
  return { w: NaN, mag: NaN, rational: NaN, phi: NaN };
}

/** |1 + L| exactly where it could be small (|L| within 1e-6 of 1); elsewhere ||L| − 1|, a lower bound. */
function distance(s: Sample): number {
  const gap = Math.abs(s.mag - 1);
  if (gap > NEAR_ONE) return gap;
  const re = 1 + s.mag * Math.cos(s.phi), im = s.mag * Math.sin(s.phi);
  return Math.sqrt(re * re + im * im);
}

const NEAR_ONE = 1e-6;

export interface Winding {
  /** Change of arg(1 + L) from a to b, rad. */
  delta: number;
  /** Least |1 + L| met (at the evaluated points and gain crossovers); exact when below 1e-6. */
  closest: number;
}

export function windingAlong(m: FactoredModel, a: number, b: number, scan: LoopScan | null): Winding {
  const budget = new ModelBudget(MAX_TURN_REFINEMENTS, 'The stability test would need too many frequency evaluations for this loop; check the model for extreme coefficients.', 'controller');
  const point = { mag: 0, phaseDeg: 0 };
  // The rational part's phase is taken without the delay: subtracting w·θ back out of the
  // total phase would cancel all digits when w·θ is large.
  const rationalPart: FactoredModel = { ...m, delay: 0 };
  let closest = Infinity;
  // Fills s with L at w: from the scan's values (mag, phaseDeg) when given, else evaluated.
  const fill = (s: Sample, w: number, mag?: number, phaseDeg?: number): Sample => {
    // Scan values carry the delay; taking it back out is exact enough while w·θ is moderate.
    if (mag !== undefined && phaseDeg !== undefined && w * m.delay < REUSE_TURNS) {
      s.mag = mag;
      s.rational = (phaseDeg * Math.PI) / 180 + w * m.delay;
    } else {
      budget.spend(1);
      pointInto(rationalPart, w, point);
      s.mag = point.mag;
      s.rational = (point.phaseDeg * Math.PI) / 180;
    }
    s.w = w;
    s.phi = s.rational - w * m.delay;
    closest = Math.min(closest, distance(s));
    return s;
  };
  const sample = (w: number): Sample => fill(emptySample(), w);
  const logMagAt = (w: number) => {
    budget.spend(1);
    pointInto(rationalPart, w, point);
    return Math.log(point.mag);
  };
  const turn = (p: Sample, q: Sample, depth: number): number => {
    if (Math.abs(q.rational - p.rational) > MAX_RATIONAL_TURN && depth < 40) {
      const mid = sample(Math.sqrt(p.w * q.w));
      return turn(p, mid, depth + 1) + turn(mid, q, depth + 1);
    }
    const pOut = p.mag > 1, qOut = q.mag > 1;
    if (pOut === qOut) return branchArg(q, pOut) - branchArg(p, pOut);
    const c = sample(bisectLog(logMagAt, p.w, q.w, Math.log(p.mag)));
    return branchArg(c, pOut) - branchArg(p, pOut) + branchArg(q, qOut) - branchArg(c, qOut);
  };
  // Between neighbours on the same side of |L| = 1 that need no refinement the change is
  // branchArg(q) − branchArg(p): along a run of them it telescopes to its two ends. Two
  // buffers take turns as the previous and next point, so the walk allocates nothing.
  let delta = 0;
  const buffers = [emptySample(), emptySample()];
  const runStart = emptySample();
  let prev: Sample | null = null;
  let runAtPrev = true;
  const visit = (w: number, index: number) => {
    const next = fill(prev === buffers[0] ? buffers[1] : buffers[0], w, index < 0 ? undefined : scan!.mag[index], index < 0 ? undefined : scan!.phaseDeg[index]);
    if (prev !== null) {
      const simple = (prev.mag > 1) === (next.mag > 1) && Math.abs(next.rational - prev.rational) <= MAX_RATIONAL_TURN;
      if (simple) {
        runAtPrev = false;
      } else {
        if (!runAtPrev) delta += branchArg(prev, prev.mag > 1) - branchArg(runStart, prev.mag > 1);
        delta += turn(prev, next, 0);
        runAtPrev = true;
        Object.assign(runStart, next);
      }
    } else {
      Object.assign(runStart, next);
    }
    prev = next;
  };
  forEachGridPoint(a, b, scan, visit);
  const last = prev as Sample | null;
  if (last && !runAtPrev) delta += branchArg(last, last.mag > 1) - branchArg(runStart, last.mag > 1);
  return { delta, closest };
}

/**
 * Calls visit for a, the scan's points inside (a, b) (with their index), a logarithmic fill
 * where the scan does not reach (index −1), and b, in ascending order.
 */
function forEachGridPoint(a: number, b: number, scan: LoopScan | null, visit: (w: number, index: number) => void): void {
  let first = -1, last = -2;
  if (scan) {
    for (let i = 0; i < scan.w.length; i++) {
      if (scan.w[i] <= a) continue;
      if (scan.w[i] >= b) break;
      if (first < 0) first = i;
      last = i;
    }
  }
  const fill = (from: number, to: number) => {
    if (!(to > from)) return;
    const n = Math.ceil(Math.log10(to / from) * PER_DECADE);
    for (let i = 1; i < n; i++) visit(from * (to / from) ** (i / n), -1);
  };
  visit(a, -1);
  if (first < 0) fill(a, b);
  else {
    fill(a, scan!.w[first]);
    for (let i = first; i <= last; i++) visit(scan!.w[i], i);
    fill(scan!.w[last], b);
  }
  visit(b, -1);
}
