/**
 * The dense frequency grid that margin and stability searches start from: logarithmic over the
 * model's time scales widened by three decades each side, plus the frequencies of every root
 * (so lightly damped resonances are not stepped over). Crossings are then refined on the exact
 * function, so results do not depend on this grid.
 */
import type { FactoredModel } from './frequency';
import { magnitudeAt, pointInto, timeScales } from './frequency';
import { cabs } from './roots';
import { boundedCount } from './budget';

/** Most points of the scan grid: 16 per decade over the whole double range is about 10 000. */
const MAX_SCAN_POINTS = 20_000;

const PER_DECADE = 16;

export function scanGrid(m: FactoredModel): number[] {
  const scales = timeScales(m);
  const lo = Math.min(...scales) / 1e3;
  let hi = Math.max(...scales) * 1e3;
  // Strictly proper loops: go on until |L| is well below 1 so no gain crossover is left out.
  if (m.pr.length > m.zr.length) {
    for (let i = 0; i < 12 && magnitudeAt(m, hi) > 0.1; i++) hi *= 10;
  }
  const a = Math.log10(lo), b = Math.log10(hi);
  const n = boundedCount(Math.ceil((b - a) * PER_DECADE) + 1, MAX_SCAN_POINTS, 'The loop\'s time scales span too many decades to scan; check the model for extreme coefficients.', 'plant');
  const w: number[] = [];
  for (let i = 0; i < n; i++) w.push(10 ** (a + ((b - a) * i) / (n - 1)));
  for (const r of [...m.poles, ...m.zeros]) {
    const mag = cabs(r.re, r.im);
    if (mag === 0) continue;
    w.push(mag);
    const im = Math.abs(r.im);
    if (im > 0 && Math.abs(r.re) < 0.5 * im) {
      for (const k of [-2, -1, -0.5, 0.5, 1, 2]) {
        const x = im + k * Math.abs(r.re);
        if (x > 0) w.push(x);
      }
    }
  }
  return w.filter((x) => x >= lo && x <= hi).sort((p, q) => p - q);
}

/** L(jw) on the scan grid, computed once per model and shared by margins and stability. */
export interface LoopScan {
  w: number[];
  mag: Float64Array;
  phaseDeg: Float64Array;
}

const scans = new WeakMap<FactoredModel, LoopScan>();

export function loopScan(m: FactoredModel): LoopScan {
  const cached = scans.get(m);
  if (cached) return cached;
  const w = scanGrid(m);
  const mag = new Float64Array(w.length);
  const phaseDeg = new Float64Array(w.length);
  const p = { mag: 0, phaseDeg: 0 };
  for (let i = 0; i < w.length; i++) {
    pointInto(m, w[i], p);
    mag[i] = p.mag;
    phaseDeg[i] = p.phaseDeg;
  }
  const scan = { w, mag, phaseDeg };
  scans.set(m, scan);
  return scan;
}

/**
 * Root of f between a and b (f(a), f(b) of opposite signs), searched in log w by Brent's method
 * (Brent 1973, "Algorithms for Minimization without Derivatives", ch. 4): bisection's safety,
 * close to secant speed; converges to about 1e-13 relative in w.
 */
export function bisectLog(f: (w: number) => number, a: number, b: number, fa: number): number {
  let xa = Math.log(a), xb = Math.log(b);
  let ya = fa, yb = f(b);
  if (yb === 0) return b;
  if ((ya < 0) === (yb < 0)) return Math.exp(0.5 * (xa + xb));
  let xc = xa, yc = ya, d = xb - xa, e = d;
  for (let i = 0; i < 100; i++) {
    if ((yb < 0) === (yc < 0)) { xc = xa; yc = ya; d = xb - xa; e = d; }
    if (Math.abs(yc) < Math.abs(yb)) { xa = xb; xb = xc; xc = xa; ya = yb; yb = yc; yc = ya; }
    const tol = 2e-16 * Math.abs(xb) + 1e-14;
    const m = 0.5 * (xc - xb);
    if (Math.abs(m) <= tol || yb === 0) break;
    if (Math.abs(e) >= tol && Math.abs(ya) > Math.abs(yb)) {
      const s = yb / ya;
      let p: number, q: number;
      if (xa === xc) { p = 2 * m * s; q = 1 - s; }
      else {
        const qa = ya / yc, r = yb / yc;
        p = s * (2 * m * qa * (qa - r) - (xb - xa) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q; else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) { e = d; d = p / q; }
      else { d = m; e = m; }
    } else { d = m; e = m; }
    xa = xb; ya = yb;
    xb += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    yb = f(Math.exp(xb));
  }
  return Math.exp(xb);
}

/** Golden-section search for the maximum of f in log w on [a, b]. */
export function maximizeLog(f: (w: number) => number, a: number, b: number): { w: number; value: number } {
  const g = (Math.sqrt(5) - 1) / 2;
  let la = Math.log(a), lb = Math.log(b);
  let l1 = lb - g * (lb - la), l2 = la + g * (lb - la);
  let f1 = f(Math.exp(l1)), f2 = f(Math.exp(l2));
  for (let i = 0; i < 60 && lb - la > 1e-7; i++) {
    if (f1 < f2) { la = l1; l1 = l2; f1 = f2; l2 = la + g * (lb - la); f2 = f(Math.exp(l2)); }
    else { lb = l2; l2 = l1; f2 = f1; l1 = lb - g * (lb - la); f1 = f(Math.exp(l1)); }
  }
  return f1 > f2 ? { w: Math.exp(l1), value: f1 } : { w: Math.exp(l2), value: f2 };
}
