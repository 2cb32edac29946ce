/**
 * Closed-loop time responses of r → e = r − ym → C → (+ d) → G → y → H → ym with the dead
 * times of G and H taken exactly. Without dead time in the loop the closed loop is rational and
 * simulated exactly. With dead time θ = θG + θH the loop is cut at the delay: the rational part
 * (C·G_R, then H_R) is advanced exactly over each fixed step for an error signal that is linear
 * within the step (first-order hold); the step divides θ so the delayed measurement is a stored
 * sample; when θ is shorter than a step the one unknown sample is solved for. The output, delayed
 * by θG, is read between stored samples by cubic Hermite interpolation (dz/dt is known exactly).
 * The dead time is never replaced by a rational approximation.
 */
import { ModelError, type TransferFunction } from './types';
import { add, degree, multiply } from './polynomial';
import { cascade, discretizeStates as discretize, toStateSpace } from './state-space';
import { impulseResponse, stepResponse, type TimeResponse } from './simulate';
import { roots } from './roots';
import { gridStep, timeGrid } from './time-grid';

/** The loop's blocks: controller C (may be improper), plant G and sensor H with their dead times. */
export interface Loop {
  controller: TransferFunction;
  plant: TransferFunction;
  sensor: TransferFunction;
}

export type LoopInput = 'setpoint' | 'load';

/**
 * Options for the fixed-step simulation. The step is at most tFinal/minSteps and at most half
 * the fastest time constant of the loop's blocks (but no more than maxSteps steps in all), and
 * it divides the loop dead time exactly so that delayed samples fall on stored ones.
 */
export interface ClosedLoopOptions {
  /** Least number of internal steps over the horizon; default 1000. */
  minSteps?: number;
  /** Most internal steps over the horizon; default 200 000. */
  maxSteps?: number;
}

/** Internal step: see ClosedLoopOptions. */
function internalStep(span: number, theta: number, fastest: number, options: ClosedLoopOptions): number {
  let h = span / (options.minSteps ?? 1000);
  if (fastest > 0) h = Math.min(h, 0.5 / fastest);
  h = Math.max(h, span / (options.maxSteps ?? 200000));
  if (theta >= h) h = theta / Math.ceil(theta / h - 1e-9);
  return h;
}

function fastestRate(g: TransferFunction): number {
  return Math.max(0, ...roots(g.den).map((r) => Math.hypot(r.re, r.im)));
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
  const { phi, g0, g1 } = discretize(ss, h);
  const n = ss.n;
  const [cz, cm] = ss.c;
  const [dz, dm] = ss.d;
  // Known forcing by the load step: z2 = G_R·d and m2 = H_R·G_R·d, exact on the internal grid.
  const inner = input === 'load' ? timeGrid(steps * h, steps + 1) : [];
  const z2 = input === 'load' ? stepResponse(gR, inner).y : null;
  const z2Rate = input === 'load' ? impulseResponse(gR, inner).y : null;
  const m2 = input === 'load' ? stepResponse({ num: multiply(hR.num, gR.num), den: multiply(hR.den, gR.den), delay: 0 }, inner).y : null;
  const r = input === 'setpoint' ? 1 : 0;
  const zHist = new Float64Array(steps + 1);
  // dz/dt at each node, for cubic Hermite interpolation of the output between nodes.
  const zRate = new Float64Array(steps + 1);
  const czA = new Float64Array(n);
  let czB = 0;
  for (let k = 0; k < n; k++) {
    czB += cz[k] * ss.b[k];
    for (let j = 0; j < n; j++) czA[j] += cz[k] * ss.a[k * n + j];
  }
  const mHist = new Float64Array(steps + 1);
  let x: Float64Array = new Float64Array(n);
  let xn: Float64Array = new Float64Array(n);
  const pred = new Float64Array(n);
  let cmg1 = dm;
  for (let k = 0; k < n; k++) cmg1 += cm[k] * g1[k];
  // The step divides θ when θ ≥ h, so the delayed measurement is the stored sample `lag` back.
  const lag = theta >= h ? Math.round(theta / h) : 0;
  const zero = new Float64Array(steps + 1);
  const zF = z2 ?? zero, zRateF = z2Rate ?? zero, mF = m2 ?? zero;
  let e = r;
  for (let i = 0; i <= steps; i++) {
    let zi = dz * e + zF[i];
    let mi = dm * e + mF[i];
    let zr = czB * e + zRateF[i];
    for (let k = 0; k < n; k++) {
      const xk = x[k];
      zi += cz[k] * xk;
      mi += cm[k] * xk;
      zr += czA[k] * xk;
    }
    zHist[i] = zi;
    zRate[i] = zr;
    mHist[i] = mi;
    if (i === steps) break;
    for (let a = 0; a < n; a++) {
      let s = g0[a] * e;
      const row = a * n;
      for (let b = 0; b < n; b++) s += phi[row + b] * x[b];
      pred[a] = s;
    }
    let eNext: number;
    if (lag > 0) {
      const j = i + 1 - lag;
      eNext = j >= 0 ? r - mHist[j] : r;
    } else {
      // θ < h: m at (i+1)h − θ lies inside this step and depends on e(i+1) itself (linear, solved directly).
      const alpha = 1 - theta / h;
      let beta = mF[i + 1];
      for (let k = 0; k < n; k++) beta += cm[k] * pred[k];
      eNext = (r - (1 - alpha) * mi - alpha * beta) / (1 + alpha * cmg1);
    }
    for (let a = 0; a < n; a++) xn[a] = pred[a] + g1[a] * eNext;
    const swap = x;
    x = xn;
    xn = swap;
    e = eNext;
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
