/**
 * Classic graphical estimates from a step test, used as the starting point of the least-squares
 * fit: the two-point 28.3 %/63.2 % method for FOPDT (Smith 1972: τ = 1.5·(t63 − t28),
 * θ = t63 − τ), Skogestad's half rule read backwards for SOPDT starts, and the tangent to the
 * final ramp for IPDT. Times are measured from the step instant.
 */
import type { StepTest } from './identify-step';

/** Moving average over an odd window (prefix sums); keeps noise from setting the crossing times. */
function smooth(y: number[], window: number): number[] {
  const half = Math.floor(window / 2);
  const prefix = [0];
  for (const v of y) prefix.push(prefix[prefix.length - 1] + v);
  return y.map((_, i) => {
    const lo = Math.max(0, i - half);
    const hi = Math.min(y.length - 1, i + half);
    return (prefix[hi + 1] - prefix[lo]) / (hi - lo + 1);
  });
}

function mean(values: number[]): number {
  return values.reduce((a, b) => a + b, 0) / values.length;
}

/** Level of y before the step: the mean of the pre-step samples, else of the first three. */
export function baseline(test: StepTest): number {
  const pre = test.y.slice(0, test.stepIndex);
  return mean(pre.length > 0 ? pre : test.y.slice(0, 3));
}

/** Level of y at the end: the mean of the last 10 % of the samples (at least 3). */
export function finalLevel(test: StepTest): number {
  const count = Math.max(3, Math.round(test.y.length / 10));
  return mean(test.y.slice(-count));
}

/** First time after the step at which the smoothed, normalized response reaches `level`, interpolated. */
function crossing(test: StepTest, r: number[], level: number): number | null {
  for (let i = Math.max(1, test.stepIndex); i < r.length; i++) {
    if (r[i] >= level && r[i - 1] < level) {
      const f = (level - r[i - 1]) / (r[i] - r[i - 1]);
      return test.t[i - 1] + f * (test.t[i] - test.t[i - 1]) - test.stepTime;
    }
  }
  return null;
}

export interface FirstOrderGuess {
  /** Change of y per unit of u. */
  k: number;
  tau: number;
  theta: number;
}

export function twoPointGuess(test: StepTest): FirstOrderGuess {
  const y0 = baseline(test);
  const yEnd = finalLevel(test);
  const span = test.t[test.t.length - 1] - test.stepTime;
  const window = 2 * Math.floor(test.y.length / 100) + 1;
  const r = smooth(test.y, window).map((v) => (v - y0) / (yEnd - y0 || 1));
  const t28 = crossing(test, r, 0.283);
  const t63 = crossing(test, r, 0.632);
  const k = (yEnd - y0) / test.stepSize;
  if (t28 === null || t63 === null || !(t63 > t28)) return { k, tau: span / 4, theta: 0 };
  const tau = 1.5 * (t63 - t28);
  return { k, tau, theta: Math.max(0, t63 - tau) };
}

/**
 * SOPDT starts for τ2/τ1 ratios: the half rule says the FOPDT fit of a SOPDT has τ ≈ τ1 + τ2/2
 * and θ ≈ θ + τ2/2 (Skogestad 2003), so invert it for each ratio.
 */
export function secondOrderGuesses(first: FirstOrderGuess): { k: number; tau1: number; tau2: number; theta: number }[] {
  return [0.05, 0.25, 0.5, 1].map((ratio) => {
    const tau1 = first.tau / (1 + ratio / 2);
    const tau2 = ratio * tau1;
    return { k: first.k, tau1, tau2, theta: Math.max(0, first.theta - tau2 / 2) };
  });
}

/** Tangent method: a line through the last 40 % of the post-step samples meets the baseline at θ. */
export function rampGuess(test: StepTest): { k: number; theta: number } {
  const y0 = baseline(test);
  const start = test.stepIndex + Math.floor(0.6 * (test.t.length - test.stepIndex));
  const t = test.t.slice(start);
  const y = test.y.slice(start);
  const tm = mean(t);
  const ym = mean(y);
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < t.length; i++) {
    sxy += (t[i] - tm) * (y[i] - ym);
    sxx += (t[i] - tm) ** 2;
  }
  const slope = sxx > 0 ? sxy / sxx : 0;
  if (slope === 0) return { k: 0, theta: 0 };
  const meetsBaseline = tm + (y0 - ym) / slope;
  return { k: slope / test.stepSize, theta: Math.max(0, meetsBaseline - test.stepTime) };
}
