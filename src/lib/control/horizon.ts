/**
 * Automatic simulation horizon (s): long enough for the slowest decaying mode to fall to e^−8
 * (far inside a 2 % band) after the dead time; for unstable or integrating responses, ten times
 * the slowest time scale. With dead time in a loop, the closed-loop roots are estimated with a
 * second-order Padé approximant — for choosing the horizon only; the caller then checks by
 * simulation that the response has settled and extends the horizon if it has not.
 */
import type { Complex, TransferFunction } from './types';
import { add, multiply, product } from './polynomial';
import { roots } from './roots';
import { cabs } from './roots';

const DECAY = 8;

export function horizonFromRoots(list: readonly Complex[], delay: number, scales: readonly number[]): number {
  const stable = list.length > 0 && list.every((r) => r.re < 0);
  let t: number;
  if (stable) {
    const slowest = Math.min(...list.map((r) => -r.re));
    const fastest = Math.max(...list.map((r) => cabs(r.re, r.im)));
    t = delay + DECAY / slowest;
    // Oscillatory modes: show at least a couple of periods of the slowest one.
    const osc = list.filter((r) => r.im !== 0).map((r) => (2 * Math.PI) / Math.abs(r.im));
    if (osc.length) t = Math.max(t, delay + 2 * Math.max(...osc));
    if (!Number.isFinite(t) || t <= 0) t = delay + DECAY / fastest;
  } else {
    const nonZero = scales.filter((s) => s > 0);
    t = delay + (nonZero.length ? 10 / Math.min(...nonZero) : 10 * Math.max(delay, 1));
    // Growing modes: show about e^6 of growth, not an overflow.
    const growth = Math.max(0, ...list.map((r) => r.re));
    if (growth > 0) t = Math.min(t, delay + 6 / growth);
  }
  return Math.min(Math.max(t, 1e-9), 1e9);
}

/** Approximate roots of 1 + L = 0 with e^(−θs) ≈ (1 − θs/2 + θ²s²/12)/(1 + θs/2 + θ²s²/12). */
export function padeClosedLoopRoots(blocks: readonly TransferFunction[], delay: number): Complex[] {
  const q = (delay * delay) / 12;
  const np = [q, -delay / 2, 1];
  const dp = [q, delay / 2, 1];
  const den = multiply(product(blocks.map((b) => b.den)), dp);
  const num = multiply(product(blocks.map((b) => b.num)), np);
  return roots(add(den, num));
}
