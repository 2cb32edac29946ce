import type { Claim } from '../schemas';

/** How each metric reads on a page, and its unit. */
export const METRIC_LABELS: Record<Claim['metric'], { label: string; unit: string }> = {
  overshootPct: { label: 'Overshoot', unit: '%' },
  riseTime: { label: 'Rise time (10–90 %)', unit: 's' },
  settlingTime: { label: 'Settling time (2 %)', unit: 's' },
  peak: { label: 'Peak', unit: '' },
  iae: { label: 'IAE', unit: 's' },
  phaseMarginDeg: { label: 'Phase margin', unit: '°' },
  gainMargin: { label: 'Gain margin', unit: '' },
  delayMargin: { label: 'Delay margin', unit: 's' },
  ms: { label: 'Peak sensitivity Ms', unit: '' },
  mt: { label: 'Complementary peak Mt', unit: '' },
};

const TIME_METRICS = new Set<Claim['metric']>(['overshootPct', 'riseTime', 'settlingTime', 'peak', 'iae']);

/** A number as a page shows it: three significant figures, "∞" and "—" for none. */
export function formatFigure(value: number | null, unit = ''): string {
  if (value === null || Number.isNaN(value)) return '—';
  if (!Number.isFinite(value)) return '∞';
  // Round-off of a figure that is zero in exact arithmetic (e.g. 2e-14 % overshoot) reads as 0.
  if (Math.abs(value) < 1e-9) value = 0;
  const text = Math.abs(value) >= 1000 ? value.toFixed(0) : Number(value.toPrecision(3)).toString();
  return unit ? `${text} ${unit}`.replace(' °', '°') : text;
}

/** "Overshoot ≤ 5 % (setpoint step)". */
export function claimLabel(claim: Claim): string {
  const { label, unit } = METRIC_LABELS[claim.metric];
  const op = claim.op === '<=' ? '≤' : '≥';
  const step = TIME_METRICS.has(claim.metric) ? ` (${claim.input} step)` : '';
  return `${label} ${op} ${formatFigure(claim.value, unit)}${step}`;
}
