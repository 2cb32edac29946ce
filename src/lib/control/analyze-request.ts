/**
 * Checks of the `analyses` part of an analyze request, with the contract's defaults
 * (points 1001, at least 2, at most 100 000; input "setpoint"; w finite and > 0).
 */
import { ModelError } from './types';

export interface StepRequest {
  /** Horizon in s; chosen so that the response settles when absent. */
  tFinal?: number;
  /** Samples from 0 to tFinal inclusive. */
  points: number;
  input: 'setpoint' | 'load';
}

export interface FrequencyRequest {
  /** Frequencies in rad/s; an automatic logarithmic grid when absent. */
  w?: number[];
  /** Points of the automatic grid; default 200. */
  points?: number;
}

/** As a caller may send it: true for defaults, or an object. */
export interface AnalysesRequest {
  step?: boolean | Partial<StepRequest>;
  frequency?: boolean | FrequencyRequest;
  margins?: boolean;
  poles?: boolean;
}

export interface CheckedAnalyses {
  step: StepRequest | null;
  frequency: FrequencyRequest | null;
  margins: boolean;
  poles: boolean;
}

const MAX_POINTS = 100000;

function bad(message: string, field: string): never {
  throw new ModelError(message, 'invalid_request', field);
}

function isObject(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function checkStep(v: unknown): StepRequest | null {
  if (v === undefined || v === false) return null;
  const o = v === true ? {} : v;
  if (!isObject(o)) bad('analyses.step must be true or an object { tFinal?, points?, input? }.', 'analyses.step');
  const points = o.points ?? 1001;
  if (typeof points !== 'number' || !Number.isInteger(points) || points < 2 || points > MAX_POINTS) {
    bad(`The number of points must be a whole number from 2 to ${MAX_POINTS}.`, 'analyses.step.points');
  }
  if (o.tFinal !== undefined && (typeof o.tFinal !== 'number' || !Number.isFinite(o.tFinal) || o.tFinal <= 0)) {
    bad('tFinal must be a finite number of seconds above zero (or left out to choose it automatically).', 'analyses.step.tFinal');
  }
  const input = o.input ?? 'setpoint';
  if (input !== 'setpoint' && input !== 'load') bad('The step input must be "setpoint" or "load".', 'analyses.step.input');
  return { tFinal: o.tFinal as number | undefined, points: points as number, input };
}

function checkFrequency(v: unknown): FrequencyRequest | null {
  if (v === undefined || v === false) return null;
  const o = v === true ? {} : v;
  if (!isObject(o)) bad('analyses.frequency must be true or an object { w? }.', 'analyses.frequency');
  if (o.points !== undefined && (typeof o.points !== 'number' || !Number.isInteger(o.points) || o.points < 2 || o.points > MAX_POINTS)) {
    bad(`The number of frequency points must be a whole number from 2 to ${MAX_POINTS}.`, 'analyses.frequency.points');
  }
  if (o.w === undefined) return { points: o.points as number | undefined };
  if (!Array.isArray(o.w) || o.w.length === 0 || o.w.length > MAX_POINTS) {
    bad(`w must be a list of 1 to ${MAX_POINTS} frequencies in rad/s.`, 'analyses.frequency.w');
  }
  o.w.forEach((x, i) => {
    if (typeof x !== 'number' || !Number.isFinite(x) || x <= 0) bad('Each frequency must be a finite number above zero (rad/s).', `analyses.frequency.w.${i}`);
  });
  return { w: o.w as number[] };
}

function flag(v: unknown, field: string): boolean {
  if (v === undefined) return false;
  if (typeof v !== 'boolean') bad(`${field} must be true or false.`, field);
  return v;
}

/** Validated analyses; when the whole block is absent, every analysis runs with defaults. */
export function checkAnalyses(v: unknown): CheckedAnalyses {
  if (v === undefined || v === null) return { step: checkStep(true), frequency: checkFrequency(true), margins: true, poles: true };
  if (!isObject(v)) bad('analyses must be an object naming the analyses to run.', 'analyses');
  return {
    step: checkStep(v.step),
    frequency: checkFrequency(v.frequency),
    margins: flag(v.margins, 'analyses.margins'),
    poles: flag(v.poles, 'analyses.poles'),
  };
}
