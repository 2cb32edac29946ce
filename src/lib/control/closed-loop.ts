/**
 * Closed-loop time responses of r → e = r − ym → C → (+ d) → G → y → H → ym with the dead
 * times of G and H taken exactly. Without dead time in the loop the closed loop is rational and
 * simulated exactly. With dead time θ = θG + θH the loop is cut at the delay: the rational part
 * (C·G_R, then H_R) is one state-space system, advanced exactly over each fixed step for an error
 * signal that is the cubic Hermite interpolant of the delayed measurement and its rate (both
 * stored at every node; the step divides θ, so delayed samples are stored ones). The scheme is
 * fourth order in the step. When θ is shorter than a step, the error is taken linear within the
 * step and its one unknown end value is solved for (second order). The output, delayed by θG,
 * is read between nodes by cubic Hermite interpolation (dz/dt is known exactly). The dead time
 * is never replaced by a rational approximation.
 */
import { ModelError, type TransferFunction } from './types';
import { add, degree, multiply } from './polynomial';
import { cascade, discretizeCubic, discretizeStates as discretize, toStateSpace } from './state-space';
import { impulseResponse, stepResponse, type TimeResponse } from './simulate';
import { roots } from './roots';
import { gridStep, timeGrid } from './time-grid';
import { cabs } from './roots';

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
 * all), and it divides the loop dead time exactly so that delayed samples fall on stored ones.
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
  return Math.max(0, ...roots(g.den).map((r) => cabs(r.re, r.im)));
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

/** Unit step response of the closed loop to the setpoint or to a load at the plant input. */
export function closedLoopStep(loop: Loop, t: readonly number[], input: LoopInput = 'setpoint', options: ClosedLoopOptions = {}): TimeResponse {
  const theta = loop.plant.delay + loop.sensor.delay;
  if (theta === 0) return stepResponse(closedLoopTransferFunction(loop, input), t);
  gridStep(t);
  const span = t[t.length - 1] - t[0];
  const rational = (g: TransferFunction): TransferFunction => ({ num: g.num, den: g.den, delay: 0 });
  const gR = rational(loop.plant);
  const hR = rational(loop.sensor);
  const p = { num: multiply(loop.controller.num, gR.num), den: multiply(loop.controller.den, gR.den), delay: 0 };
  if (degree(p.num) > degree(p.den)) {
    throw new ModelError('With dead time in the loop, controller times plant must be proper; add a derivative filter.', 'invalid_model', 'controller');
  }
  const h = internalStep(span, theta, Math.max(fastestRate(p), fastestRate(hR)), options);
  const steps = Math.ceil(span / h - 1e-9);
  const ss = cascade(toStateSpace(p), toStateSpace(hR));
  const n = ss.n;
  const [cz, cm] = ss.c;
  const [dz, dm] = ss.d;
  // Known forcing by the load step: z2 = G_R·d and m2 = H_R·G_R·d (and their rates), exact on the grid.
  const load = input === 'load';
  const inner = load ? timeGrid(steps * h, steps + 1) : [];
  const hg = { num: multiply(hR.num, gR.num), den: multiply(hR.den, gR.den), delay: 0 };
  const zero = new Float64Array(steps + 1);
  const zF = load ? stepResponse(gR, inner).y : zero;
  const zRateF = load ? impulseResponse(gR, inner).y : zero;
  const mF = load ? stepResponse(hg, inner).y : zero;
  const mRateF = load ? impulseResponse(hg, inner).y : zero;
  const r = input === 'setpoint' ? 1 : 0;
  const zHist = new Float64Array(steps + 1);
  const mHist = new Float64Array(steps + 1);
  // Rates at each node: dz/dt for the Hermite output, dm/dt for the cubic hold of the error.
  const zRate = new Float64Array(steps + 1);
  const mRate = new Float64Array(steps + 1);
  const rowTimesA = (c: Float64Array): { ca: Float64Array; cb: number } => {
    const ca = new Float64Array(n);
    let cb = 0;
    for (let k = 0; k < n; k++) {
      cb += c[k] * ss.b[k];
      for (let j = 0; j < n; j++) ca[j] += c[k] * ss.a[k * n + j];
    }
    return { ca, cb };
  };
  const { ca: czA, cb: czB } = rowTimesA(cz);
  const { ca: cmA, cb: cmB } = rowTimesA(cm);
  let x: Float64Array = new Float64Array(n);
  let xn: Float64Array = new Float64Array(n);
  const pred = new Float64Array(n);
  // The step divides θ when θ ≥ h, so the delayed measurement is the stored sample `lag` back.
  const lag = theta >= h ? Math.round(theta / h) : 0;
  const cubic = lag > 0 ? discretizeCubic(ss, h) : null;
  const foh = lag > 0 ? null : discretize(ss, h);
  const phi = cubic ? cubic.phi : foh!.phi;
  let cmg1 = dm;
  if (foh) for (let k = 0; k < n; k++) cmg1 += cm[k] * foh.g1[k];
  let e = r;
  let eRate = 0;
  for (let i = 0; i <= steps; i++) {
    let zi = dz * e + zF[i], mi = dm * e + mF[i];
    let zr = czB * e + dz * eRate + zRateF[i], mr = cmB * e + dm * eRate + mRateF[i];
    for (let k = 0; k < n; k++) {
      const xk = x[k];
      zi += cz[k] * xk;
      mi += cm[k] * xk;
      zr += czA[k] * xk;
      mr += cmA[k] * xk;
    }
    zHist[i] = zi;
    mHist[i] = mi;
    zRate[i] = zr;
    mRate[i] = mr;
    if (i === steps) break;
    for (let a = 0; a < n; a++) {
      const row = a * n;
      let s = 0;
      for (let b = 0; b < n; b++) s += phi[row + b] * x[b];
      pred[a] = s;
    }
    if (cubic) {
      // e over the step is the cubic Hermite interpolant of the delayed measurement; before the
      // delayed start (j ≤ 0 from the left) the measurement is still at rest.
      const j = i + 1 - lag;
      const eEnd = j > 0 ? r - mHist[j] : r;
      const dEnd = j > 0 ? -mRate[j] * h : 0;
      const dStart = eRate * h;
      for (let a = 0; a < n; a++) xn[a] = pred[a] + cubic.ge0[a] * e + cubic.ge1[a] * eEnd + cubic.gd0[a] * dStart + cubic.gd1[a] * dEnd;
      e = j >= 0 ? r - mHist[j] : r;
      eRate = j >= 0 ? -mRate[j] : 0;
    } else {
      // θ < h: m at (i+1)h − θ lies inside this step and depends on e(i+1) itself (linear, solved directly).
      const g = foh!;
      const alpha = 1 - theta / h;
      let beta = mF[i + 1];
      for (let a = 0; a < n; a++) pred[a] += g.g0[a] * e;
      for (let k = 0; k < n; k++) beta += cm[k] * pred[k];
      const eNext = (r - (1 - alpha) * mi - alpha * beta) / (1 + alpha * cmg1);
      for (let a = 0; a < n; a++) xn[a] = pred[a] + g.g1[a] * eNext;
      eRate = (eNext - e) / h;
      e = eNext;
    }
    const swap = x;
    x = xn;
    xn = swap;
  }
  const y = t.map((tk) => {
    const tau = tk - t[0] - loop.plant.delay;
    if (tau < -1e-9 * h) return 0;
    const f = Math.max(0, tau / h);
    const j = Math.floor(f);
    if (j >= steps) return zHist[steps];
    const u = f - j;
    const u2 = u * u, u3 = u2 * u;
    return (2 * u3 - 3 * u2 + 1) * zHist[j] + (u3 - 2 * u2 + u) * h * zRate[j] + (3 * u2 - 2 * u3) * zHist[j + 1] + (u3 - u2) * h * zRate[j + 1];
  });
  return { t: [...t], y };
}
