/**
 * The frequency calculator's data: Bode magnitude (dB) and continuous phase of the loop
 * L = C·G·H on a grid around its crossovers, the Nyquist curve of L(jω) for ω > 0, and the
 * circle |1 + L| = 1/Ms (centre −1, radius 1/Ms) that the curve touches at the sensitivity peak.
 */
import { analyze } from '../control/analyze';
import type { Margins } from '../control/types';
import type { PidControllerInput } from '../schemas/controller';
import type { ProcessModelInput } from '../schemas/process-model';
import type { TransferFunctionInput } from '../schemas/transfer-function';
import { modelToTf } from './loop';

/** Frequencies per plot; log-spaced. */
export const FREQUENCY_POINTS = 300;
/** Points on the Ms circle. */
const CIRCLE_POINTS = 97;

export interface FrequencyViewRequest {
  model: ProcessModelInput;
  controller: PidControllerInput;
  sensor?: TransferFunctionInput;
}

export interface FrequencyViewResult {
  w: number[];
  magDb: number[];
  phaseDeg: number[];
  /** Re and Im of L(jω) on the same grid. */
  re: number[];
  im: number[];
  margins: Margins;
  /** The Ms circle; empty when the loop has no finite Ms. */
  circle: { re: number[]; im: number[] };
}

/** n frequencies from lo to hi, evenly spaced in log ω. */
export function logGrid(lo: number, hi: number, n: number): number[] {
  const a = Math.log10(lo);
  const b = Math.log10(hi);
  return Array.from({ length: n }, (_, i) => 10 ** (a + ((b - a) * i) / (n - 1)));
}

/** Two decades below the lowest crossover to one decade above the highest. */
export function gridAround(m: Pick<Margins, 'gainCrossover' | 'phaseCrossover'>): { lo: number; hi: number } | null {
  const marks = [m.gainCrossover, m.phaseCrossover].filter((w): w is number => w !== null && w > 0);
  if (marks.length === 0) return null;
  return { lo: Math.min(...marks) / 100, hi: Math.max(...marks) * 10 };
}

/** Points of the circle centred at −1 with radius 1/ms, closed. */
export function msCircle(ms: number): { re: number[]; im: number[] } {
  if (!(ms > 0 && Number.isFinite(ms))) return { re: [], im: [] };
  const r = 1 / ms;
  const angles = Array.from({ length: CIRCLE_POINTS }, (_, i) => (2 * Math.PI * i) / (CIRCLE_POINTS - 1));
  return { re: angles.map((a) => -1 + r * Math.cos(a)), im: angles.map((a) => r * Math.sin(a)) };
}

/** Bode, Nyquist and margins of the loop. */
export function frequencyView(request: FrequencyViewRequest): FrequencyViewResult {
  const base = { plant: modelToTf(request.model), sensor: request.sensor, controller: request.controller };
  const first = analyze({ ...base, analyses: { margins: true } });
  const margins = first.margins!;
  const span = gridAround(margins);
  const frequency = span ? { w: logGrid(span.lo, span.hi, FREQUENCY_POINTS) } : { points: FREQUENCY_POINTS };
  const response = analyze({ ...base, analyses: { frequency } }).frequency!;
  const rad = Math.PI / 180;
  return {
    w: response.w,
    magDb: response.mag.map((m) => 20 * Math.log10(m)),
    phaseDeg: response.phaseDeg,
    re: response.mag.map((m, i) => m * Math.cos(response.phaseDeg[i]! * rad)),
    im: response.mag.map((m, i) => m * Math.sin(response.phaseDeg[i]! * rad)),
    margins,
    circle: msCircle(margins.ms),
  };
}
