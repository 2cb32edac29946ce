/**
 * The dense frequency grid that margin and stability searches start from: logarithmic over the
 * model's time scales widened by three decades each side, plus the frequencies of every root
 * (so lightly damped resonances are not stepped over). Crossings are then refined on the exact
 * function, so results do not depend on this grid; a denser grid of values already computed
 * (the requested frequency response) may stand in for part of it.
 */
import type { FactoredModel } from './frequency';
import { magnitudeAt, pointInto, timeScales } from './frequency';
import { cabs } from './roots';
import { boundedCount } from './budget';

/** Most points of the scan grid: 16 per decade over the whole double range is about 10 000. */
const MAX_SCAN_POINTS = 20_000;

const PER_DECADE = 16;

/** L(jw) already computed on an ascending grid (e.g. the requested frequency response). */
export interface KnownValues {
  w: readonly number[];
  mag: readonly number[];
  phaseDeg: readonly number[];
}

/** Largest ratio between neighbouring scan points. */
const MAX_RATIO = 10 ** (1 / PER_DECADE);

/**
 * The scan grid, with the points of `known` standing in for the logarithmic grid over their
 * range when they are at least as dense (so they need not be evaluated again); the root
 * frequencies are always included. `fromKnown[i]` is the index into known of point i, or −1.
 */
function scanPoints(m: FactoredModel, known: KnownValues | null): { w: number[]; fromKnown: number[] } {
  const scales = timeScales(m);
  const lo = Math.min(...scales) / 1e3;
  let hi = Math.max(...scales) * 1e3;
  // Strictly proper loops: go on until |L| is well below 1 so no gain crossover is left out.
  if (m.pr.length > m.zr.length) {
    for (let i = 0; i < 12 && magnitudeAt(m, hi) > 0.1; i++) hi *= 10;
  }
  const a = Math.log10(lo), b = Math.log10(hi);
  const n = boundedCount(Math.ceil((b - a) * PER_DECADE) + 1, MAX_SCAN_POINTS, 'The loop\'s time scales span too many decades to scan; check the model for extreme coefficients.', 'plant');
  const seed = known && denseEnough(known.w) ? known : null;
  const from = seed ? seed.w[0] : Infinity, to = seed ? seed.w[seed.w.length - 1] : -Infinity;
  // Three sorted sources merged: the logarithmic grid (outside the seed's range), the seed, the
  // roots; sized up front, so the merge does not grow arrays as it goes.
  const grid = new Float64Array(n);
  let gridLength = 0;
  const at = (i: number) => Math.exp(Math.LN10 * (a + ((b - a) * i) / (n - 1)));
  for (let i = 0; i < n; i++) {
    const x = at(i);
    if (x < from || x > to) grid[gridLength++] = x;
    // Skip to the first grid point past the seed (one below it, against rounding).
    else if (Number.isFinite(to)) i = Math.max(i, Math.floor(((Math.log10(to) - a) / (b - a)) * (n - 1)) - 1);
  }
  const roots = rootFrequencies(m);
  // Only as many seed points as the scan's own density needs: margins and the Nyquist walk visit each.
  const picked = seed ? thinned(seed.w) : [];
  const seedLength = picked.length;
  const capacity = gridLength + seedLength + roots.length;
  const all = new Float64Array(capacity);
  const indices = new Int32Array(capacity);
  let count = 0;
  let g = 0, k = 0, r = 0;
  while (g < gridLength || k < seedLength || r < roots.length) {
    const xg = g < gridLength ? grid[g] : Infinity;
    const xk = k < seedLength ? seed!.w[picked[k]] : Infinity;
    const xr = r < roots.length ? roots[r] : Infinity;
    let x: number, index = -1;
    if (xr <= xg && xr <= xk) x = roots[r++];
    else if (xk <= xg) { x = xk; index = picked[k++]; }
    else x = grid[g++];
    if (x >= lo && x <= hi) { all[count] = x; indices[count++] = index; }
  }
  const w = new Array<number>(count);
  const fromKnown = new Array<number>(count);
  for (let i = 0; i < count; i++) { w[i] = all[i]; fromKnown[i] = indices[i]; }
  return { w, fromKnown };
}

/** Indices of a dense ascending grid kept so that no gap exceeds MAX_RATIO (first and last always). */
function thinned(w: readonly number[]): number[] {
  const out = [0];
  let last = w[0];
  for (let j = 1; j < w.length; j++) {
    // Keep j when skipping it would leave a gap wider than the scan's own spacing.
    if (j === w.length - 1 || w[j + 1] > last * MAX_RATIO) {
      out.push(j);
      last = w[j];
    }
  }
  return out;
}

/** Ascending, positive, finite and at least PER_DECADE points per decade throughout. */
function denseEnough(w: readonly number[]): boolean {
  if (w.length < 2 || !(w[0] > 0)) return false;
  for (let i = 1; i < w.length; i++) if (!(w[i] > w[i - 1] && w[i] <= w[i - 1] * MAX_RATIO && Number.isFinite(w[i]))) return false;
  return true;
}

/** The scan grid of m (see the module comment). */
export function scanGrid(m: FactoredModel): number[] {
  return scanPoints(m, null).w;
}

/** Every root's frequency, and the flanks of lightly damped pairs, sorted. */
function rootFrequencies(m: FactoredModel): number[] {
  const out: number[] = [];
  const add = (re: number, im: number) => {
    const mag = cabs(re, im);
    if (mag === 0) return;
    out.push(mag);
    const y = Math.abs(im);
    if (y > 0 && Math.abs(re) < 0.5 * y) {
      for (const k of FLANKS) {
        const x = y + k * Math.abs(re);
        if (x > 0) out.push(x);
      }
    }
  };
  for (let i = 0; i < m.pr.length; i++) add(m.pr[i], m.pi[i]);
  for (let i = 0; i < m.zr.length; i++) add(m.zr[i], m.zi[i]);
  return out.sort((p, q) => p - q);
}

/** Offsets, in units of |Re|, around a lightly damped pair's frequency (its resonance peak). */
const FLANKS = [-2, -1, -0.5, 0.5, 1, 2];

/** L(jw) on the scan grid, computed once per model and shared by margins and stability. */
export interface LoopScan {
  w: number[];
  mag: Float64Array;
  phaseDeg: Float64Array;
}

const scans = new WeakMap<FactoredModel, LoopScan>();
const seeds = new WeakMap<FactoredModel, KnownValues>();

/**
 * Offers values of L already computed (e.g. the requested frequency response of the same model)
 * to the model's scan, should one be needed later; they are used where dense enough.
 */
export function seedScan(m: FactoredModel, known: KnownValues): void {
  if (!scans.has(m)) seeds.set(m, known);
}

/** The model's scan, computed on first use (from the seeded values where there are any). */
export function loopScan(m: FactoredModel): LoopScan {
  const cached = scans.get(m);
  if (cached) return cached;
  const known = seeds.get(m) ?? null;
  seeds.delete(m);
  const { w, fromKnown } = scanPoints(m, known);
  const mag = new Float64Array(w.length);
  const phaseDeg = new Float64Array(w.length);
  const p = { mag: 0, phaseDeg: 0 };
  for (let i = 0; i < w.length; i++) {
    const k = fromKnown[i];
    if (k >= 0) {
      mag[i] = known!.mag[k];
      phaseDeg[i] = known!.phaseDeg[k];
      continue;
    }
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

/**
 * Maximum of f in log w on [a, b] by Brent's method (Brent 1973, ch. 5, "localmin"): golden
 * sections where parabolic interpolation is unsafe, parabolas near the peak, so a smooth peak
 * takes about a dozen evaluations (written here: one small routine, no optimizer bundle needed).
 */
export function maximizeLog(f: (w: number) => number, a: number, b: number): { w: number; value: number } {
  const g = (3 - Math.sqrt(5)) / 2;
  let lo = Math.log(a), hi = Math.log(b);
  let x = lo + g * (hi - lo), v = x, u = x;
  let fx = -f(Math.exp(x)), fv = fx, fu = fx;
  let wPt = x, fw = fx;
  let d = 0, e = 0;
  for (let i = 0; i < 100; i++) {
    const mid = 0.5 * (lo + hi);
    const tol = 1e-8 * Math.abs(x) + 1e-10;
    if (Math.abs(x - mid) <= 2 * tol - 0.5 * (hi - lo)) break;
    let golden = true;
    if (Math.abs(e) > tol) {
      // Parabola through x, w and v.
      let r = (x - wPt) * (fx - fv);
      let q = (x - v) * (fx - fw);
      let p = (x - v) * q - (x - wPt) * r;
      q = 2 * (q - r);
      if (q > 0) p = -p; else q = -q;
      const eOld = e;
      e = d;
      if (Math.abs(p) < Math.abs(0.5 * q * eOld) && p > q * (lo - x) && p < q * (hi - x)) {
        d = p / q;
        u = x + d;
        if (u - lo < 2 * tol || hi - u < 2 * tol) d = x < mid ? tol : -tol;
        golden = false;
      }
    }
    if (golden) {
      e = (x < mid ? hi : lo) - x;
      d = g * e;
    }
    u = x + (Math.abs(d) >= tol ? d : d > 0 ? tol : -tol);
    fu = -f(Math.exp(u));
    if (fu <= fx) {
      if (u < x) hi = x; else lo = x;
      v = wPt; fv = fw;
      wPt = x; fw = fx;
      x = u; fx = fu;
    } else {
      if (u < x) lo = u; else hi = u;
      if (fu <= fw || wPt === x) { v = wPt; fv = fw; wPt = u; fw = fu; }
      else if (fu <= fv || v === x || v === wPt) { v = u; fv = fu; }
    }
  }
  return { w: Math.exp(x), value: -fx };
}
