/**
 * Step-response figures exactly as the contract defines them (shared/api-v1.md):
 * rise time from first reaching 10 % to first reaching 90 % of the final value, settling time
 * as the last time |y − final| exceeds 2 % of |final| (from t = 0, dead time included), peak and
 * overshoot; crossing times interpolated linearly between samples. Levels and bands are options.
 */
import type { StepInfo } from './types';

export interface StepInfoOptions {
  /** Steady-state value; null when there is none (unstable or integrating). Default: the last sample. */
  finalValue?: number | null;
  /** Value before the step; levels are measured from it. Default 0 (the contract's definition). */
  initialValue?: number;
  /** Rise-time levels as fractions of the change. Default [0.1, 0.9]. */
  riseLimits?: [number, number];
  /** Settling band as a fraction of |final − initial|. Default 0.02. */
  settlingBand?: number;
}

const NONE: StepInfo = { finalValue: null, riseTime: null, settlingTime: null, overshootPct: null, peak: null, peakTime: null };

/** Time at which y first reaches level (moving from the initial value towards it); null if never. */
function firstReach(t: readonly number[], y: readonly number[], level: number, up: boolean): number | null {
  const reached = (v: number) => (up ? v >= level : v <= level);
  if (reached(y[0])) return t[0];
  for (let k = 1; k < y.length; k++) {
    if (reached(y[k])) {
      const w = (level - y[k - 1]) / (y[k] - y[k - 1]);
      return t[k - 1] + w * (t[k] - t[k - 1]);
    }
  }
  return null;
}

/** Step information of the samples (t in s). */
export function stepInfo(t: readonly number[], y: readonly number[], options: StepInfoOptions = {}): StepInfo {
  if (t.length === 0 || y.length !== t.length) return NONE;
  const y0 = options.initialValue ?? 0;
  const finalValue = options.finalValue === undefined ? y[y.length - 1] : options.finalValue;
  if (finalValue === null || !Number.isFinite(finalValue) || y.some((v) => !Number.isFinite(v))) return NONE;
  const change = finalValue - y0;
  if (change === 0) {
    let k = 0;
    for (let i = 1; i < y.length; i++) if (Math.abs(y[i] - y0) > Math.abs(y[k] - y0)) k = i;
    return { ...NONE, finalValue, peak: y[k], peakTime: t[k] };
  }
  const up = change > 0;
  const [lo, hi] = options.riseLimits ?? [0.1, 0.9];
  const tLo = firstReach(t, y, y0 + lo * change, up);
  const tHi = firstReach(t, y, y0 + hi * change, up);
  const band = (options.settlingBand ?? 0.02) * Math.abs(change);
  let settlingTime: number | null = t[0];
  const outside = (v: number) => Math.abs(v - finalValue) > band;
  if (outside(y[y.length - 1])) settlingTime = null;
  else {
    for (let k = y.length - 2; k >= 0; k--) {
      if (outside(y[k])) {
        // Interpolate where |y − final| comes back to the band edge between k and k + 1.
        const edge = finalValue + Math.sign(y[k] - finalValue) * band;
        const w = (edge - y[k]) / (y[k + 1] - y[k]);
        settlingTime = t[k] + Math.min(1, Math.max(0, w)) * (t[k + 1] - t[k]);
        break;
      }
    }
  }
  let kp = 0;
  for (let i = 1; i < y.length; i++) if (up ? y[i] > y[kp] : y[i] < y[kp]) kp = i;
  const peak = y[kp];
  const overshootPct = Math.max(0, ((peak - finalValue) / change) * 100);
  return {
    finalValue,
    riseTime: tLo !== null && tHi !== null ? tHi - tLo : null,
    settlingTime,
    overshootPct,
    peak,
    peakTime: t[kp],
  };
}
