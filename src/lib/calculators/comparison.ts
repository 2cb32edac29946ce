/**
 * The tuning-comparison calculator's data: the engine's side-by-side comparison of every
 * applicable rule (compareRules), plus each rule's closed-loop setpoint step on one shared
 * horizon so the responses can be overlaid.
 */
import { analyze } from '../control/analyze';
import { fromProcessModel } from '../control/process-model';
import { compareRules, type ComparisonRow, type ComparisonSkip } from '../control/tuning/compare';
import type { PidController, ProcessModel } from '../control/types';

/** Samples per overlaid response. */
export const COMPARISON_POINTS = 401;

export interface ComparisonRequest {
  model: ProcessModel;
  controller: 'pi' | 'pid';
  /** Derivative filter divisor for the predicted loops; default 10. */
  n?: number;
}

export interface RowWithResponse extends ComparisonRow {
  /** The rule's settings as the engine's controller (filter divisor included). */
  pid: PidController;
  /** y of the setpoint step on the shared grid; null for an unstable loop. */
  y: number[] | null;
}

export interface ComparisonResult {
  rows: RowWithResponse[];
  skipped: ComparisonSkip[];
  /** The shared time grid, s. */
  t: number[];
  tFinal: number;
}

/** A horizon that shows every stable rule settle: 1.5 × the slowest settling time. */
export function sharedHorizon(rows: readonly ComparisonRow[], fallback: number): number {
  const settle = rows.map((r) => r.predicted.settlingTime).filter((s): s is number => s !== null && s > 0);
  return settle.length ? 1.5 * Math.max(...settle) : fallback;
}

/** Every applicable rule with its predicted figures and its setpoint response. */
export function compareWithResponses(request: ComparisonRequest): ComparisonResult {
  const n = request.n ?? 10;
  const { rows, skipped } = compareRules({ model: request.model, controller: request.controller, n });
  const plant = fromProcessModel(request.model);
  const scale = request.model.type === 'fopdt' ? request.model.tau + request.model.theta : request.model.type === 'sopdt' ? request.model.tau1 + request.model.tau2 + request.model.theta : 20 * Math.max(request.model.theta, 1);
  const tFinal = sharedHorizon(rows, 10 * scale);
  let t: number[] = [];
  const withResponses = rows.map((row) => {
    const pid: PidController = { form: row.controller.form, kc: row.controller.kc, ti: row.controller.ti, td: row.controller.td, n };
    if (!row.predicted.stable) return { ...row, pid, y: null };
    const step = analyze({ plant, controller: pid, analyses: { step: { tFinal, points: COMPARISON_POINTS } } }).step!;
    t = step.t;
    return { ...row, pid, y: step.y };
  });
  if (t.length === 0) t = Array.from({ length: COMPARISON_POINTS }, (_, i) => (tFinal * i) / (COMPARISON_POINTS - 1));
  return { rows: withResponses, skipped, t, tFinal };
}
