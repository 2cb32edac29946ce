import { CLAIM_METRICS, type CLAIM_INPUTS, type CLAIM_OPS } from '../../lib/schemas/claim-vocabulary';
import { TUNING_RULE_IDS } from '../../lib/recipes/vocabulary';

export { CLAIM_METRICS, TUNING_RULE_IDS };

/**
 * The claims, sensor and tuning rule as the form holds them: numbers stay the text the author
 * typed (so "1e" or "" is never lost or turned into 0), and become numbers only in the payload.
 */
export interface ClaimRow {
  metric: (typeof CLAIM_METRICS)[number];
  op: (typeof CLAIM_OPS)[number];
  /** The bound as typed, in the metric's unit. */
  value: string;
  input: (typeof CLAIM_INPUTS)[number];
}

/** H(s) as typed: coefficients comma-separated, highest power of s first; delay in s. */
export interface SensorRow {
  num: string;
  den: string;
  delay: string;
}

/** The tuning rule as typed; rule '' = not stated yet. */
export interface TuningRow {
  rule: '' | (typeof TUNING_RULE_IDS)[number];
  /** The rule's closed-loop time constant as typed, s. */
  designTime: string;
  note: string;
}

export const NEW_CLAIM: ClaimRow = { metric: 'overshootPct', op: '<=', value: '', input: 'setpoint' };
export const NO_TUNING: TuningRow = { rule: '', designTime: '', note: '' };

/** A typed number, or the text itself when it is not one, so the server names the field that is wrong. */
export function typedNumber(text: string): number | string {
  const t = text.trim();
  const n = Number(t);
  return t !== '' && Number.isFinite(n) ? n : t;
}

const coefficients = (text: string) => text.split(',').map((x) => x.trim()).filter(Boolean).map(typedNumber);

/** The claims for the API (every row, so a row with a bad value is refused, not dropped). */
export function claimsPayload(rows: ClaimRow[]) {
  return rows.map((r) => ({ metric: r.metric, op: r.op, value: typedNumber(r.value), input: r.input }));
}

/** The sensor for the API, or null when none is written. */
export function sensorPayload(s: SensorRow | null) {
  if (!s || (!s.num.trim() && !s.den.trim())) return null;
  return { num: coefficients(s.num), den: coefficients(s.den), delay: s.delay.trim() === '' ? 0 : typedNumber(s.delay) };
}

/** The tuning rule for the API, or null when no rule is chosen. */
export function tuningPayload(t: TuningRow) {
  if (!t.rule) return null;
  return {
    rule: t.rule,
    ...(t.designTime.trim() ? { designTime: typedNumber(t.designTime) } : {}),
    ...(t.note.trim() ? { note: t.note.trim() } : {}),
  };
}

const text = (v: unknown) => (typeof v === 'number' && Number.isFinite(v) ? String(v) : '');

/** Claim rows from a recipe's claims (as the API answers them). */
export function claimRows(claims: unknown): ClaimRow[] {
  if (!Array.isArray(claims)) return [];
  return claims.map((c) => ({ ...NEW_CLAIM, ...c, value: text(c?.value) }));
}

/** The sensor row from a recipe's sensor, or null. */
export function sensorRow(sensor: unknown): SensorRow | null {
  const s = sensor as { num?: number[]; den?: number[]; delay?: number } | null | undefined;
  if (!s?.num || !s.den) return null;
  return { num: s.num.join(', '), den: s.den.join(', '), delay: text(s.delay ?? 0) };
}

/** The tuning row from a recipe's tuning rule. */
export function tuningRow(rule: unknown): TuningRow {
  const r = rule as { rule?: TuningRow['rule']; designTime?: number; note?: string } | null | undefined;
  if (!r?.rule) return { ...NO_TUNING };
  return { rule: r.rule, designTime: text(r.designTime), note: r.note ?? '' };
}
