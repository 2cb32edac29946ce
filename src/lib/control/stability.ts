/**
 * Poles, zeros and stability. A loop without dead time is judged by the roots of its
 * characteristic polynomial; with dead time by the Nyquist criterion (Z = P − Δarg(1 + L)/2π along
 * the Nyquist contour, indented to the right of imaginary-axis poles), the argument taken
 * between the gain crossovers in closed form (winding.ts), so the cost does not grow with the
 * dead time.
 */
import type { Complex, TransferFunction } from './types';
import { type FactoredModel, pointInto, timeScales } from './frequency';
import { add, product } from './polynomial';
import { roots } from './roots';
import { loopScan } from './scan-grid';
import { windingAlong } from './winding';
import { cabs } from './roots';

/** A root with its damping ratio ζ = −re/|p| and natural frequency ωn = |p| (rad/s). */
export interface RootInfo extends Complex {
  /** Damping ratio; null for a root at the origin. */
  damping: number | null;
  /** Natural frequency in rad/s. */
  naturalFrequency: number;
}

export function rootInfo(r: Complex): RootInfo {
  const wn = cabs(r.re, r.im);
  return { re: r.re, im: r.im, damping: wn === 0 ? null : -r.re / wn, naturalFrequency: wn };
}

/** Real part counted as zero (on the imaginary axis) below this fraction of the root's size. */
const AXIS_TOL = 1e-9;

function onAxis(r: Complex): boolean {
  return Math.abs(r.re) <= AXIS_TOL * Math.max(cabs(r.re, r.im), 1e-300);
}

/** All roots strictly in the left half plane (nothing on the imaginary axis). */
export function allInLeftHalfPlane(list: readonly Complex[]): boolean {
  return list.every((r) => r.re < 0 && !onAxis(r));
}

/** Closed-loop characteristic polynomial Π den + Π num of a delay-free loop. */
export function characteristicPolynomial(blocks: readonly TransferFunction[]): number[] {
  return add(product(blocks.map((b) => b.den)), product(blocks.map((b) => b.num)));
}

/** Whether the unity negative feedback loop around L = Π blocks is asymptotically stable. */
export function closedLoopStable(blocks: readonly TransferFunction[], loop: FactoredModel): boolean {
  if (loop.delay === 0) return allInLeftHalfPlane(roots(characteristicPolynomial(blocks)));
  return nyquistUnstableCount(loop) === 0;
}

/**
 * Number of closed-loop roots in the closed right half plane of 1 + L(s) = 0, L with dead time.
 * A root on the imaginary axis counts as unstable (returns at least 1).
 */
export function nyquistUnstableCount(m: FactoredModel): number {
  const relDeg = m.pr.length - m.zr.length;
  if (relDeg < 0) return Infinity;
  // Biproper with dead time: a neutral loop, unstable when |L(∞)| ≥ 1.
  if (relDeg === 0 && Math.abs(m.gain) >= 1) return Infinity;
  const rhp = m.poles.filter((p) => p.re > 0 && !onAxis(p)).length;
  const axis = m.poles.filter((p) => onAxis(p) && p.im >= 0);
  const origin = axis.filter((p) => p.im === 0 || Math.abs(p.im) <= AXIS_TOL * cabs(p.re, p.im)).length;
  const scales = timeScales(m);
  const eps = Math.min(...scales) * 1e-3;
  const wEnd = endFrequency(m, scales);
  // Split the positive imaginary axis at the poles on it (indented to the right).
  const cuts = [...new Set(axis.map((p) => Math.abs(p.im)).filter((w) => w > eps))].sort((a, b) => a - b);
  const indentCount = axis.length - origin;
  const bounds = [eps, ...cuts.flatMap((c) => [c * (1 - 1e-7), c * (1 + 1e-7)]), wEnd];
  let delta = 0;
  let closest = Infinity;
  if (cuts.length === 0) {
    const seg = windingAlong(m, eps, wEnd, loopScan(m));
    delta = seg.delta;
    closest = seg.closest;
  } else {
    for (let k = 0; k + 1 < bounds.length; k += 2) {
      const seg = windingAlong(m, bounds[k], bounds[k + 1], null);
      delta += seg.delta;
      closest = Math.min(closest, seg.closest);
    }
  }
  const end = onePlusL(m, wEnd);
  // Beyond wEnd, |L| < 1 stays inside a disc around 1: no more encirclements.
  const total = 2 * (delta - Math.atan2(end.im, end.re)) - Math.PI * origin - 2 * Math.PI * indentCount;
  if (closest < 1e-10) return Math.max(1, rhp);
  return Math.max(0, Math.round(rhp - total / (2 * Math.PI)));
}

const point = { mag: 0, phaseDeg: 0 };

function onePlusL(m: FactoredModel, w: number): Complex {
  pointInto(m, w, point);
  const ph = (point.phaseDeg * Math.PI) / 180;
  return { re: 1 + point.mag * Math.cos(ph), im: point.mag * Math.sin(ph) };
}

/** A frequency beyond which |L(jw)| < 1 − margin for sure (bound from the root magnitudes). */
function endFrequency(m: FactoredModel, scales: number[]): number {
  const rMax = Math.max(...scales, ...[...m.poles, ...m.zeros].map((r) => cabs(r.re, r.im)));
  const limit = m.pr.length === m.zr.length ? (1 + Math.abs(m.gain)) / 2 : 0.5;
  let w = 2 * rMax;
  const bound = (x: number) => {
    let v = Math.abs(m.gain);
    for (const z of m.zeros) v *= x + cabs(z.re, z.im);
    for (const p of m.poles) v /= x - cabs(p.re, p.im);
    return v;
  };
  for (let i = 0; i < 200 && bound(w) >= limit; i++) w *= 2;
  return w;
}

/** Open-path stability: every pole strictly in the left half plane (dead time does not matter). */
export function openPathStable(m: FactoredModel): boolean {
  return allInLeftHalfPlane(m.poles);
}

/** Poles of the rational part as given (no cancellation), sorted by real then imaginary part. */
export function polesOf(m: FactoredModel): Complex[] {
  return m.poles.map((p) => ({ re: p.re, im: p.im }));
}

