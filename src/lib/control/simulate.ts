/**
 * Time responses of an open path G(s) = R(s)·e^(−θs) from rest. The dead time is exact:
 * y(t) = y_R(t − θ), where y_R is propagated exactly (matrix exponential) from the instant
 * t − θ = 0, so samples need not fall on multiples of θ.
 */
import type { TransferFunction } from './types';
import { ModelError } from './types';
import { series } from './connect';
import { discretizeStates as discretize, toStateSpace, type StateSpace } from './state-space';
import { gridStep } from './time-grid';
import { stepLimit } from './budget';

/** A sampled response; t in s. */
export interface TimeResponse {
  t: number[];
  y: number[];
}

function output(ss: StateSpace, x: Float64Array, u: number): number {
  const c = ss.c[0];
  let s = ss.d[0] * u;
  for (let i = 0; i < ss.n; i++) s += c[i] * x[i];
  return s;
}

function firstIndexAtOrAfter(t: readonly number[], instant: number): number {
  let k = 0;
  while (k < t.length && t[k] - t[0] < instant * (1 - 1e-12)) k++;
  return k;
}

/**
 * Core propagation from rest with input u(τ) (τ = time since the delayed start), linear between
 * the samples handed to it: the state is advanced with the first-order hold, exact for such inputs.
 */
function propagate(g: TransferFunction, t: readonly number[], input: (tau: number) => number, impulse: boolean): number[] {
  const dt = gridStep(t);
  const ss = toStateSpace(g);
  if (t.length > stepLimit(ss.n)) {
    throw new ModelError(
      `A response of ${t.length} points of a model of order ${ss.n} takes too much work; ask for at most ${stepLimit(ss.n)} points.`,
      'invalid_request',
      'analyses.step.points',
    );
  }
  const y = new Array<number>(t.length).fill(0);
  const k0 = firstIndexAtOrAfter(t, g.delay);
  if (k0 >= t.length) return y;
  const first = Math.max(0, t[k0] - t[0] - g.delay);
  let x: Float64Array = new Float64Array(ss.n);
  if (impulse) {
    x = Float64Array.from(ss.b);
  }
  if (first > 0) {
    const d0 = discretize(ss, first);
    x = step(ss.n, d0.phi, d0.g0, d0.g1, x, impulse ? 0 : input(0), impulse ? 0 : input(first));
  }
  const d = discretize(ss, dt);
  let tau = first;
  for (let k = k0; k < t.length; k++) {
    const u = impulse ? 0 : input(tau);
    y[k] = output(ss, x, u);
    if (k + 1 < t.length) {
      x = step(ss.n, d.phi, d.g0, d.g1, x, u, impulse ? 0 : input(tau + dt));
      tau += dt;
    }
  }
  return y;
}

function step(n: number, phi: Float64Array, g0: Float64Array, g1: Float64Array, x: Float64Array, u0: number, u1: number): Float64Array {
  const out = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = g0[i] * u0 + g1[i] * u1;
    for (let j = 0; j < n; j++) s += phi[i * n + j] * x[j];
    out[i] = s;
  }
  return out;
}

/** Unit step response on an evenly spaced grid t (s). */
export function stepResponse(g: TransferFunction, t: readonly number[]): TimeResponse {
  return { t: [...t], y: propagate(g, t, () => 1, false) };
}

/** Unit impulse response (the regular part; a direct feedthrough's Dirac is left out). */
export function impulseResponse(g: TransferFunction, t: readonly number[]): TimeResponse {
  return { t: [...t], y: propagate(g, t, () => 0, true) };
}

/** Response to the unit ramp u(t) = t (per second). */
export function rampResponse(g: TransferFunction, t: readonly number[]): TimeResponse {
  return stepResponse(series(g, { num: [1], den: [1, 0], delay: 0 }), t);
}

/**
 * Response to a sampled input u on the evenly spaced grid t, linear between samples (as
 * scipy.signal.lsim), from rest; before t[0] the input is taken as zero.
 */
export function simulateInput(g: TransferFunction, t: readonly number[], u: readonly number[]): TimeResponse {
  if (u.length !== t.length) throw new ModelError('The input needs one value per time sample.', 'invalid_request', 'u');
  u.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new ModelError('Input values must be finite numbers.', 'invalid_request', `u.${i}`);
  });
  const dt = gridStep(t);
  const at = (tau: number): number => {
    const f = tau / dt;
    const j = Math.min(Math.floor(f), u.length - 1);
    if (j >= u.length - 1) return u[u.length - 1];
    const w = f - j;
    return u[j] + w * (u[j + 1] - u[j]);
  };
  return { t: [...t], y: propagate(g, t, at, false) };
}
