/**
 * Closed-loop time responses of r → e = r − ym → C → (+ d) → G → y → H → ym with the dead
 * times of G and H taken exactly. Without dead time in the loop the closed loop is rational and
 * simulated exactly. With dead time θ = θG + θH the loop is cut at the delay and stepped
 * (delayed-loop.ts); the output, delayed by θG, is read between the steps' nodes. The dead time
 * is never replaced by a rational approximation.
 */
import { ModelError, type Complex, type TransferFunction } from './types';
import { modalForm } from './modal';
import { add, degree, multiply } from './polynomial';
import { cascade, toStateSpace } from './state-space';
import { readDelayed, stepDelayedLoop, type Forcing } from './delayed-loop';
import { impulseResponse, rampResponse, simulateInput, stepResponse, type TimeResponse } from './simulate';
import { roots } from './roots';
import { gridStep, timeGrid } from './time-grid';
import { cabs } from './roots';
import { boundedCount, stepLimit } from './budget';

/** The loop's blocks: controller C (may be improper), plant G and sensor H with their dead times. */
export interface Loop {
  controller: TransferFunction;
  plant: TransferFunction;
  sensor: TransferFunction;
}

export type LoopInput = 'setpoint' | 'load';

/**
 * Options for the fixed-step simulation. The step is at most tFinal/minSteps, the fastest time
 * constant of the loop's blocks, θ/4 and 0.5/loopBandwidth (but no more than maxSteps steps in
 * all, fewer for high orders: budget.ts), and it divides the loop dead time exactly so that delayed samples fall on stored ones.
 */
export interface ClosedLoopOptions {
  /** Least number of internal steps over the horizon; default 250. */
  minSteps?: number;
  /** Most internal steps over the horizon; default 50 000. */
  maxSteps?: number;
  /**
   * Highest frequency (rad/s) at which the loop still has gain (|L| ≥ ½, e.g. from the margin
   * scan); the step is kept at or below 0.5/that so closed-loop oscillations are resolved.
   */
  loopBandwidth?: number;
  /**
   * The poles of C·G (the controller's and the plant's blocks' roots) when the caller has them:
   * found block by block they are more accurate than the roots of the expanded product, and
   * they are not searched for again.
   */
  forwardPoles?: readonly Complex[];
}

/** Internal step: see ClosedLoopOptions. */
function internalStep(span: number, theta: number, fastest: number, options: ClosedLoopOptions): number {
  let h = span / (options.minSteps ?? 250);
  if (fastest > 0) h = Math.min(h, 1 / fastest);
  // Oscillations a dead time allows have periods of a few θ: resolve them too.
  h = Math.min(h, theta / 4);
  if (options.loopBandwidth && options.loopBandwidth > 0) h = Math.min(h, 0.5 / options.loopBandwidth);
  h = Math.max(h, span / (options.maxSteps ?? 50000));
  if (theta >= h) h = theta / Math.ceil(theta / h - 1e-9);
  return h;
}

function fastestRate(g: TransferFunction): number {
  return largestMagnitude(roots(g.den));
}

function largestMagnitude(list: readonly Complex[]): number {
  return Math.max(0, ...list.map((r) => cabs(r.re, r.im)));
}

/** Rational closed loop Y/R or Y/D of a loop without dead time. */
export function closedLoopTransferFunction(loop: Loop, input: LoopInput): TransferFunction {
  const { controller: c, plant: g, sensor: h } = loop;
  const den = add(multiply(multiply(c.den, g.den), h.den), multiply(multiply(c.num, g.num), h.num));
  const num = input === 'setpoint' ? multiply(multiply(c.num, g.num), h.den) : multiply(multiply(g.num, c.den), h.den);
  if (degree(den) === -Infinity) throw new ModelError('The closed loop is degenerate: 1 + C·G·H is identically zero.', 'invalid_model', 'controller');
  if (degree(num) > degree(den)) {
    throw new ModelError('The closed loop is improper (an unfiltered derivative on a plant without lag); add a derivative filter.', 'invalid_model', 'controller');
  }
  return { num, den, delay: g.delay + h.delay };
}

/** A test signal: a unit step, a unit ramp (1 per s) or samples on the response's time grid (linear between them). */
export type LoopSignal = 'step' | 'ramp' | { samples: readonly number[] };

/** What drives the loop: the setpoint and/or a load added to the plant input (superposed). */
export interface LoopDrive {
  setpoint?: LoopSignal;
  load?: LoopSignal;
}

/** A closed-loop response with its rate dy/dt (1/s), which is also the impulse response of a step drive. */
export interface LoopResponse extends TimeResponse {
  rate: number[];
}

/** Unit step response of the closed loop to the setpoint or to a load at the plant input. */
export function closedLoopStep(loop: Loop, t: readonly number[], input: LoopInput = 'setpoint', options: ClosedLoopOptions = {}): TimeResponse {
  const r = loopResponse(loop, t, input === 'setpoint' ? { setpoint: 'step' } : { load: 'step' }, options, false);
  return { t: [...t], y: r.y };
}

/** Impulse response (regular part) of the closed loop: the rate of its step response. */
export function closedLoopImpulse(loop: Loop, t: readonly number[], input: LoopInput = 'setpoint', options: ClosedLoopOptions = {}): TimeResponse {
  const r = closedLoopResponse(loop, t, input === 'setpoint' ? { setpoint: 'step' } : { load: 'step' }, options);
  return { t: r.t, y: r.rate };
}

function sampledAt(samples: readonly number[], t0: number, dt: number): { at: (x: number) => number; slope: (x: number) => number } {
  const last = samples.length - 1;
  const seg = (x: number) => Math.min(Math.max(0, Math.floor((x - t0) / dt)), last - 1);
  return {
    at: (x) => {
      if (last === 0) return samples[0];
      const j = seg(x);
      return samples[j] + ((x - t0 - j * dt) / dt) * (samples[j + 1] - samples[j]);
    },
    slope: (x) => (last === 0 ? 0 : (samples[seg(x) + 1] - samples[seg(x)]) / dt),
  };
}

function signalFunctions(sig: LoopSignal | undefined, t: readonly number[], dt: number, field: string): { at: (x: number) => number; slope: (x: number) => number } {
  if (sig === undefined) return { at: () => 0, slope: () => 0 };
  if (sig === 'step') return { at: () => 1, slope: () => 0 };
  if (sig === 'ramp') return { at: (x) => x - t[0], slope: () => 1 };
  if (sig.samples.length !== t.length) throw new ModelError('A sampled signal needs one value per time sample.', 'invalid_request', field);
  sig.samples.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new ModelError('Signal values must be finite numbers.', 'invalid_request', `${field}.${i}`);
  });
  return sampledAt(sig.samples, t[0], dt);
}

/** Open-path response of g to a signal, and its rate, on the evenly spaced grid t. */
function openResponse(g: TransferFunction, t: readonly number[], sig: LoopSignal | undefined, dt: number): { y: number[]; rate: number[] } {
  if (sig === undefined) return { y: new Array<number>(t.length).fill(0), rate: new Array<number>(t.length).fill(0) };
  if (sig === 'step') return { y: stepResponse(g, t).y, rate: impulseResponse(g, t).y };
  if (sig === 'ramp') return { y: rampResponse(g, t).y, rate: stepResponse(g, t).y };
  const f = sampledAt(sig.samples.length === t.length ? sig.samples : resample(sig.samples, t.length), t[0], dt);
  const u = t.map((x) => f.at(x));
  const y = simulateInput(g, t, u).y;
  // dy/dt = (g driven by du/dt) + u(0)·(impulse response of g): the input starts from rest at t[0].
  const slopes = t.map((x) => f.slope(x + 0.5 * dt));
  const fromSlope = simulateInput(g, t, slopes).y;
  const fromStart = impulseResponse(g, t).y;
  return { y, rate: fromSlope.map((v, i) => v + u[0] * fromStart[i]) };
}

function resample(samples: readonly number[], n: number): number[] {
  return Array.from({ length: n }, (_, i) => samples[Math.round((i * (samples.length - 1)) / Math.max(1, n - 1))]);
}

function sumOf(a: number[], b: number[]): number[] {
  return a.map((v, i) => v + b[i]);
}

/** Closed-loop response to a setpoint and/or load signal (superposed), dead times exact. */
export function closedLoopResponse(loop: Loop, t: readonly number[], drive: LoopDrive, options: ClosedLoopOptions = {}): LoopResponse {
  const r = loopResponse(loop, t, drive, options, true);
  return { t: [...t], y: r.y, rate: r.rate! };
}

function loopResponse(loop: Loop, t: readonly number[], drive: LoopDrive, options: ClosedLoopOptions, withRate: boolean): { y: number[]; rate: number[] | null } {
  const theta = loop.plant.delay + loop.sensor.delay;
  const dtOut = gridStep(t);
  if (theta === 0) {
    const sp = openResponse(closedLoopTransferFunction(loop, 'setpoint'), t, drive.setpoint, dtOut);
    const ld = openResponse(closedLoopTransferFunction(loop, 'load'), t, drive.load, dtOut);
    return { y: sumOf(sp.y, ld.y), rate: sumOf(sp.rate, ld.rate) };
  }
  const rSig = signalFunctions(drive.setpoint, t, dtOut, 'setpoint');
  signalFunctions(drive.load, t, dtOut, 'load');
  const span = t[t.length - 1] - t[0];
  const rational = (g: TransferFunction): TransferFunction => ({ num: g.num, den: g.den, delay: 0 });
  const gR = rational(loop.plant);
  const hR = rational(loop.sensor);
  const p = { num: multiply(loop.controller.num, gR.num), den: multiply(loop.controller.den, gR.den), delay: 0 };
  if (degree(p.num) > degree(p.den)) {
    throw new ModelError('With dead time in the loop, controller times plant must be proper; add a derivative filter.', 'invalid_model', 'controller');
  }
  const sensorStates = toStateSpace(hR);
  const pPoles = options.forwardPoles?.length === p.den.length - 1 ? options.forwardPoles : roots(p.den);
  // With a static sensor and well-separated real poles the loop steps in modal coordinates (n, not n², per step).
  const forward = (sensorStates.n === 0 ? modalForm(p, pPoles) : null) ?? toStateSpace(p);
  const ss = cascade(forward, sensorStates);
  // Higher orders take fewer steps (each costs n²), so the work stays within the budget.
  const maxSteps = Math.min(options.maxSteps ?? 50000, stepLimit(ss.n));
  const fastest = Math.max(largestMagnitude(pPoles), fastestRate(hR));
  const h = internalStep(span, theta, fastest, { ...options, maxSteps });
  const steps = boundedCount(Math.ceil(span / h - 1e-9), 2 * maxSteps + 2, 'The closed-loop simulation would need too many steps; shorten tFinal.', 'analyses.step.tFinal');
  const forcing = drive.load === undefined ? null : loadForcing(gR, hR, drive.load, steps, h, dtOut);
  const reference = { at: (x: number) => rSig.at(t[0] + x), slope: (x: number) => rSig.slope(t[0] + x) };
  const history = stepDelayedLoop(ss, h, steps, theta, reference, forcing, sensorStates.n === 0 ? sensorStates.d[0] : null);
  return readDelayed(history, t, loop.plant.delay, withRate);
}

/** Known forcing by the load: z = G_R·d and m = H_R·G_R·d (and their rates) on the internal grid. */
function loadForcing(gR: TransferFunction, hR: TransferFunction, load: LoopSignal, steps: number, h: number, dtOut: number): Forcing {
  const hg = { num: multiply(hR.num, gR.num), den: multiply(hR.den, gR.den), delay: 0 };
  const inner = timeGrid(steps * h, steps + 1);
  const innerLoad: LoopSignal = typeof load === 'object' ? { samples: inner.map((x) => sampledAt(load.samples, 0, dtOut).at(x)) } : load;
  const zl = openResponse(gR, inner, innerLoad, h);
  const ml = openResponse(hg, inner, innerLoad, h);
  return { z: Float64Array.from(zl.y), zRate: Float64Array.from(zl.rate), m: Float64Array.from(ml.y), mRate: Float64Array.from(ml.rate) };
}
