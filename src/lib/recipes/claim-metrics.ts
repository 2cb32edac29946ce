import type { Claim } from '../schemas';

/** The parts of the contract's analyze response that claims are read from. */
export interface LoopFigures {
  step: { t: number[]; y: number[]; info: Record<string, number | null> };
  margins: Record<string, number | null | undefined> & { ms: number };
  stable: boolean;
}

/** Metrics read from the margins of L rather than from a step response. */
export const MARGIN_METRICS = new Set<Claim['metric']>(['phaseMarginDeg', 'gainMargin', 'delayMargin', 'ms', 'mt']);

/**
 * Integral of |error| over the sampled step, trapezoid rule: error is 1 − y for a unit setpoint
 * step and −y for a unit load step (the setpoint stays 0).
 */
export function integralAbsoluteError(t: number[], y: number[], input: Claim['input']): number {
  const err = (i: number) => Math.abs(input === 'load' ? y[i] : 1 - y[i]);
  let sum = 0;
  for (let i = 1; i < t.length; i++) sum += ((err(i - 1) + err(i)) / 2) * (t[i] - t[i - 1]);
  return sum;
}

/**
 * The value of a claim's metric from the loop's figures, or null where the engine reports none.
 * A missing gain margin means the phase never reaches −180°: the margin is infinite.
 * A load step's peak is the largest deviation, so its sign (set by the loop's action) is dropped.
 */
export function metricValue(claim: Claim, figures: LoopFigures): number | null {
  if (MARGIN_METRICS.has(claim.metric)) {
    const value = figures.margins[claim.metric];
    if (claim.metric === 'gainMargin' && value == null) return Number.POSITIVE_INFINITY;
    return value ?? null;
  }
  if (claim.metric === 'iae') return integralAbsoluteError(figures.step.t, figures.step.y, claim.input);
  const value = figures.step.info[claim.metric];
  if (value == null) return null;
  return claim.metric === 'peak' && claim.input === 'load' ? Math.abs(value) : value;
}

/** Whether a value meets the claim's bound. */
export function holds(claim: Claim, value: number | null): boolean {
  if (value === null || Number.isNaN(value)) return false;
  return claim.op === '<=' ? value <= claim.value : value >= claim.value;
}
