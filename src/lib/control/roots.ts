/**
 * Roots of real polynomials by the Aberth–Ehrlich iteration with starting points from the
 * Newton polygon (Bini 1996, "Numerical computation of polynomial zeros by means of Aberth's
 * method"). Written here because no small, maintained browser package computes polynomial roots.
 */
import type { Complex } from './types';
import { derivative, trim, zeroRootCount } from './polynomial';

const EPS = 2.220446049250313e-16;

/** |a + jb| without Math.hypot's variadic overhead; falls back to it only on overflow. */
export function cabs(a: number, b: number): number {
  const s = Math.sqrt(a * a + b * b);
  return s === Infinity || (s === 0 && (a !== 0 || b !== 0)) ? Math.hypot(a, b) : s;
}
const MAX_ITERATIONS = 500;

/** All roots of p (descending coefficients), sorted by real part then imaginary part. */
export function roots(p: readonly number[]): Complex[] {
  const t = trim(p);
  if (t.length === 1) return [];
  const zeros = zeroRootCount(t);
  const core = t.slice(0, t.length - zeros);
  const found = core.length <= 3 ? lowOrderRoots(core) : mergeClusters(core, aberth(core));
  const all = [...found.map(cleanRoot), ...Array.from({ length: zeros }, () => ({ re: 0, im: 0 }))];
  return sortRoots(pairConjugates(all));
}

/** Sort by real part, then imaginary part (the contract's order). */
export function sortRoots(list: Complex[]): Complex[] {
  return list.sort((a, b) => a.re - b.re || a.im - b.im);
}

function lowOrderRoots(c: number[]): Complex[] {
  if (c.length === 2) return [{ re: -c[1] / c[0], im: 0 }];
  // Monic and scaled so that b² and 4k cannot overflow, whatever the coefficients' range.
  const b = c[1] / c[0], k = c[2] / c[0];
  const scale = Math.max(Math.abs(b), Math.sqrt(Math.abs(k)));
  const bs = b / scale;
  const disc = bs * bs - (4 * (k / scale)) / scale;
  if (disc >= 0) {
    // Stable form: avoid cancellation between −b and √disc.
    const q = -0.5 * (b + Math.sign(b || 1) * scale * Math.sqrt(disc));
    return [{ re: q, im: 0 }, { re: q !== 0 ? k / q : 0, im: 0 }];
  }
  const re = -b / 2;
  const im = (scale * Math.sqrt(-disc)) / 2;
  return [{ re, im }, { re, im: -im }];
}

/** Starting radii from the upper convex hull of (k, log|c_k|), c_k the coefficient of s^k. */
function initialGuesses(c: number[]): Complex[] {
  const n = c.length - 1;
  const pts: { k: number; v: number }[] = [];
  for (let k = 0; k <= n; k++) {
    const a = Math.abs(c[n - k]);
    if (a > 0) pts.push({ k, v: Math.log(a) });
  }
  const hull: { k: number; v: number }[] = [];
  for (const q of pts) {
    while (hull.length >= 2) {
      const a = hull[hull.length - 2];
      const b = hull[hull.length - 1];
      if ((b.v - a.v) * (q.k - a.k) <= (q.v - a.v) * (b.k - a.k)) hull.pop();
      else break;
    }
    hull.push(q);
  }
  const out: Complex[] = [];
  for (let j = 0; j + 1 < hull.length; j++) {
    const m = hull[j + 1].k - hull[j].k;
    const r = Math.exp((hull[j].v - hull[j + 1].v) / m);
    for (let i = 0; i < m; i++) {
      const ang = (2 * Math.PI * i) / m + (2 * Math.PI * j) / n + 0.4;
      out.push({ re: r * Math.cos(ang), im: r * Math.sin(ang) });
    }
  }
  return out;
}

/** Newton ratio p(z)/p'(z) and a backward-error test, evaluated in the reversed polynomial when |z| > 1. */
/** newtonRatio's answer, overwritten by each call (the iteration calls it thousands of times). */
const ratio = { re: NaN, im: NaN, small: false };

function newtonRatio(c: number[], z: Complex): { re: number; im: number; small: boolean } {
  const n = c.length - 1;
  const big = z.re * z.re + z.im * z.im > 1;
  let xr = z.re, xi = z.im;
  if (big) {
    const d = z.re * z.re + z.im * z.im;
    xr = z.re / d;
    xi = -z.im / d;
  }
  const ax = cabs(xr, xi);
  let pr = 0, pi = 0, dr = 0, di = 0, bound = 0;
  for (let i = 0; i <= n; i++) {
    const coef = big ? c[n - i] : c[i];
    const ndr = dr * xr - di * xi + pr;
    di = dr * xi + di * xr + pi;
    dr = ndr;
    const npr = pr * xr - pi * xi + coef;
    pi = pr * xi + pi * xr;
    pr = npr;
    bound = bound * ax + Math.abs(coef);
  }
  const small = cabs(pr, pi) <= 4 * EPS * bound;
  if (!big) {
    const d = dr * dr + di * di;
    if (d === 0) return answer(0, 0, true);
    return answer((pr * dr + pi * di) / d, (pi * dr - pr * di) / d, small);
  }
  // p'(z)/p(z) = n/z − x²·q'(x)/q(x), with x = 1/z and q the reversed polynomial.
  const qd = pr * pr + pi * pi;
  if (qd === 0) return answer(0, 0, true);
  const rr = (dr * pr + di * pi) / qd;
  const ri = (di * pr - dr * pi) / qd;
  const x2r = xr * xr - xi * xi;
  const x2i = 2 * xr * xi;
  const invRe = n * xr - (x2r * rr - x2i * ri), invIm = n * xi - (x2r * ri + x2i * rr);
  const d = invRe * invRe + invIm * invIm;
  return answer(invRe / d, -invIm / d, small);
}

function answer(re: number, im: number, small: boolean): typeof ratio {
  ratio.re = re;
  ratio.im = im;
  ratio.small = small;
  return ratio;
}

function aberth(c: number[]): Complex[] {
  const z = initialGuesses(c);
  const n = z.length;
  const done = new Array<boolean>(n).fill(false);
  // A few extra sweeps after the backward-error test passes sharpen ill-conditioned roots.
  const extra = new Array<number>(n).fill(0);
  for (let it = 0; it < MAX_ITERATIONS; it++) {
    let active = 0;
    for (let i = 0; i < n; i++) {
      if (done[i]) continue;
      const N = newtonRatio(c, z[i]);
      if (N.small && ++extra[i] > 8) {
        done[i] = true;
        continue;
      }
      active++;
      let sr = 0, si = 0;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        const dr = z[i].re - z[j].re;
        const di = z[i].im - z[j].im;
        const d = dr * dr + di * di;
        if (d === 0) continue;
        sr += dr / d;
        si -= di / d;
      }
      // w = N / (1 − N·S)
      const denr = 1 - (N.re * sr - N.im * si);
      const deni = -(N.re * si + N.im * sr);
      const dd = denr * denr + deni * deni;
      const wr = (N.re * denr + N.im * deni) / dd;
      const wi = (N.im * denr - N.re * deni) / dd;
      z[i].re -= wr;
      z[i].im -= wi;
      if (cabs(wr, wi) <= EPS * cabs(z[i].re, z[i].im)) done[i] = true;
    }
    if (active === 0) break;
  }
  return z;
}

function cleanRoot(r: Complex): Complex {
  return Math.abs(r.im) <= 1e-10 * cabs(r.re, r.im) ? { re: r.re, im: 0 } : r;
}

/** Roots of a real polynomial come in conjugate pairs: make each pair exact. */
function pairConjugates(list: Complex[]): Complex[] {
  const upper = list.filter((r) => r.im > 0);
  const lower = list.filter((r) => r.im < 0);
  const out = list.filter((r) => r.im === 0);
  const used = new Array<boolean>(lower.length).fill(false);
  for (const u of upper) {
    let best = -1;
    let bestD = Infinity;
    lower.forEach((l, j) => {
      const d = cabs(u.re - l.re, u.im + l.im);
      if (!used[j] && d < bestD) {
        bestD = d;
        best = j;
      }
    });
    if (best < 0 || bestD > 1e-6 * cabs(u.re, u.im)) {
      out.push(u);
      continue;
    }
    used[best] = true;
    const re = (u.re + lower[best].re) / 2;
    const im = (u.im - lower[best].im) / 2;
    out.push({ re, im }, { re, im: -im });
  }
  lower.forEach((l, j) => {
    if (!used[j]) out.push(l);
  });
  // An unpaired root of a real polynomial is real up to rounding.
  return out.map((r) => (r.im !== 0 && !isPaired(r, out) && Math.abs(r.im) <= 1e-6 * cabs(r.re, r.im) ? { re: r.re, im: 0 } : r));
}

function isPaired(r: Complex, list: Complex[]): boolean {
  return list.some((o) => o.re === r.re && o.im === -r.im);
}

/**
 * A root of multiplicity m comes out of the iteration as a cluster of radius about eps^(1/m).
 * For each tight cluster, Newton's method on p^(m−1) (where the root is simple) polishes the
 * centre; if p, p′, …, p^(m−1) all vanish there to rounding, the cluster is a multiple root and
 * is replaced by m copies of the polished centre. Genuinely distinct close roots fail that test.
 */
function mergeClusters(c: number[], list: Complex[]): Complex[] {
  const out = list.slice();
  const taken = new Array<boolean>(out.length).fill(false);
  for (let i = 0; i < out.length; i++) {
    if (taken[i]) continue;
    const scale = cabs(out[i].re, out[i].im);
    // Most roots have no neighbour within 5 %: count before building the cluster lists.
    let neighbours = 0;
    for (let j = 0; j < out.length; j++) {
      if (j !== i && !taken[j] && cabs(out[j].re - out[i].re, out[j].im - out[i].im) <= 0.05 * scale) neighbours++;
    }
    if (neighbours === 0) continue;
    const nearIdx = out.map((_, j) => j).filter((j) => !taken[j] && cabs(out[j].re - out[i].re, out[j].im - out[i].im) <= 0.05 * scale);
    const cx = nearIdx.reduce((s, j) => s + out[j].re, 0) / nearIdx.length;
    const cy = nearIdx.reduce((s, j) => s + out[j].im, 0) / nearIdx.length;
    const near = nearIdx.map((j) => ({ j, d: cabs(out[j].re - cx, out[j].im - cy) })).sort((a, b) => a.d - b.d);
    for (let m = near.length; m >= 2; m--) {
      const group = near.slice(0, m).map((x) => x.j);
      const z = polishMultiple(c, group.map((k) => out[k]), m);
      if (!isMultipleRoot(c, z, m)) continue;
      for (const k of group) {
        out[k] = { ...z };
        taken[k] = true;
      }
      break;
    }
  }
  return out;
}

/** Newton's method on p^(m−1), where a root of multiplicity m is simple, from the group's mean. */
function polishMultiple(c: number[], group: Complex[], m: number): Complex {
  let z = {
    re: group.reduce((s, r) => s + r.re, 0) / m,
    im: group.reduce((s, r) => s + r.im, 0) / m,
  };
  const d = derivative(c, m - 1);
  const dd = derivative(d, 1);
  for (let it = 0; it < 30; it++) {
    const f = horner(d, z), g = horner(dd, z);
    const den = g.re * g.re + g.im * g.im;
    if (den === 0) break;
    const step = { re: (f.re * g.re + f.im * g.im) / den, im: (f.im * g.re - f.re * g.im) / den };
    z = { re: z.re - step.re, im: z.im - step.im };
    if (cabs(step.re, step.im) <= EPS * cabs(z.re, z.im)) break;
  }
  return z;
}

function horner(c: number[], z: Complex): Complex {
  let re = 0, im = 0;
  for (const v of c) {
    const r = re * z.re - im * z.im + v;
    im = re * z.im + im * z.re;
    re = r;
  }
  return { re, im };
}

/** Whether p^(j)(z) is at rounding level for every j < m. */
function isMultipleRoot(c: number[], z: Complex, m: number): boolean {
  const a = cabs(z.re, z.im);
  for (let j = 0; j < m; j++) {
    const d = derivative(c, j);
    const v = horner(d, z);
    const bound = d.reduce((acc, x) => acc * a + Math.abs(x), 0);
    if (cabs(v.re, v.im) > 1e3 * EPS * bound) return false;
  }
  return true;
}
