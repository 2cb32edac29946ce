/**
 * A recipe's performance claims checked against the figures of the loop as it stands now, so
 * the loop-response calculator can show each claim holding or failing while the sliders move.
 */
import type { Claim } from '../schemas/claim';

/** Step figures of one response (setpoint or load), contract definitions, null where undefined. */
export interface StepFigures {
  overshootPct: number | null;
  riseTime: number | null;
  settlingTime: number | null;
  peak: number | null;
  /** ∫|error| dt over the horizon for a unit step, s. */
  iae: number | null;
}

/** Everything a claim can be about, for one loop. */
export interface LoopFigures {
  setpoint: StepFigures;
  load: StepFigures;
  phaseMarginDeg: number | null;
  gainMargin: number | null;
  delayMargin: number | null;
  ms: number | null;
  mt: number | null;
}

/** One claim and whether it holds; `actual` null means the figure is undefined (fails). */
export interface ClaimCheck {
  claim: Claim;
  actual: number | null;
  holds: boolean;
}

const STEP_METRICS = new Set<Claim['metric']>(['overshootPct', 'riseTime', 'settlingTime', 'peak', 'iae']);

/** The figure a claim is about; for a load step's peak, its magnitude (worst deviation). */
export function claimedFigure(claim: Claim, figures: LoopFigures): number | null {
  if (STEP_METRICS.has(claim.metric)) {
    const step = claim.input === 'load' ? figures.load : figures.setpoint;
    const value = step[claim.metric as keyof StepFigures];
    if (value === null) return null;
    return claim.metric === 'peak' && claim.input === 'load' ? Math.abs(value) : value;
  }
  return figures[claim.metric as Exclude<keyof LoopFigures, 'setpoint' | 'load'>];
}

/**
 * Checks each claim. An undefined figure fails the claim: "settles within 120 s" does not hold
 * for a loop that never settles. The comparison allows no tolerance; recipes state round bounds.
 */
export function checkClaims(claims: readonly Claim[], figures: LoopFigures): ClaimCheck[] {
  return claims.map((claim) => {
    const actual = claimedFigure(claim, figures);
    const holds = actual !== null && Number.isFinite(actual) && (claim.op === '<=' ? actual <= claim.value : actual >= claim.value);
    return { claim, actual, holds };
  });
}

/** Labels and units of each metric, as the claim list shows them. */
export const METRIC_LABELS: Record<Claim['metric'], { label: string; unit: string }> = {
  overshootPct: { label: 'Overshoot', unit: '%' },
  riseTime: { label: 'Rise time', unit: 's' },
  settlingTime: { label: 'Settling time', unit: 's' },
  peak: { label: 'Peak', unit: '' },
  iae: { label: 'IAE', unit: 's' },
  phaseMarginDeg: { label: 'Phase margin', unit: '°' },
  gainMargin: { label: 'Gain margin', unit: '' },
  delayMargin: { label: 'Delay margin', unit: 's' },
  ms: { label: 'Ms', unit: '' },
  mt: { label: 'Mt', unit: '' },
};
