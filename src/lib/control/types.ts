/**
 * The engine's shared vocabulary. Units: time in s, frequency in rad/s, phase in degrees,
 * gains as plain ratios unless a name ends in Db. Definitions follow shared/api-v1.md.
 */

/** G(s) = num(s)/den(s) · e^(−delay·s); coefficients in descending powers of s. */
export interface TransferFunction {
  /** Numerator coefficients, highest power of s first. */
  num: number[];
  /** Denominator coefficients, highest power of s first. */
  den: number[];
  /** Dead time in s, ≥ 0. */
  delay: number;
}

/** A complex number as a named pair (never a tuple). */
export interface Complex {
  re: number;
  im: number;
}

/** C = kc·(1 + 1/(ti·s) + td·s/(1 + (td/n)·s)). ti, td in s; ti 0 or absent = no integral. */
export interface IdealPid {
  form: 'ideal';
  kc: number;
  ti?: number;
  td?: number;
  /** Derivative filter divisor; default 10. */
  n?: number;
}

/** C = kc·(1 + 1/(ti·s))·(1 + td·s)/(1 + (td/n)·s). */
export interface SeriesPid {
  form: 'series';
  kc: number;
  ti?: number;
  td?: number;
  n?: number;
}

/** C = kp + ki/s + kd·s/(1 + tf·s). ki in 1/s, kd in s, tf in s (0 = no filter). */
export interface ParallelPid {
  form: 'parallel';
  kp: number;
  ki?: number;
  kd?: number;
  tf?: number;
}

export type PidController = IdealPid | SeriesPid | ParallelPid;

/** Step information as the contract defines it; null where undefined. */
export interface StepInfo {
  finalValue: number | null;
  riseTime: number | null;
  settlingTime: number | null;
  overshootPct: number | null;
  peak: number | null;
  peakTime: number | null;
}

/** Stability margins of a loop transfer function L. */
export interface Margins {
  gainMargin: number | null;
  gainMarginDb: number | null;
  phaseCrossover: number | null;
  phaseMarginDeg: number | null;
  gainCrossover: number | null;
  delayMargin: number | null;
  /** Peak sensitivity max |1/(1+L)|. */
  ms: number;
  /** Complementary peak max |L/(1+L)|. */
  mt: number;
  /** Closed-loop bandwidth: lowest w where |T| falls below 1/√2 of its low-frequency value; null if none. */
  bandwidth: number | null;
  /** Every w where |L| crosses 1, lowest first. */
  gainCrossovers: number[];
  /** Every w where the continuous phase crosses −180° (mod 360), lowest first. */
  phaseCrossovers: number[];
}

/** Low-order models in the trade's parameters (s for times, plain ratio for k). */
export type ProcessModel =
  | { type: 'fopdt'; k: number; tau: number; theta: number }
  | { type: 'sopdt'; k: number; tau1: number; tau2: number; theta: number }
  | { type: 'ipdt'; k: number; theta: number };

/** A validation failure the caller can act on; field is a dotted path relative to the input. */
export class ModelError extends Error {
  constructor(
    message: string,
    readonly code: 'invalid_model' | 'invalid_request' = 'invalid_model',
    readonly field?: string,
  ) {
    super(message);
    this.name = 'ModelError';
  }
}
