/**
 * Fixed-step simulation of a feedback loop cut at its dead time θ. The rational part (C·G_R,
 * then H_R) is one state-space system with two outputs, z = C·G_R·e and m = H_R·z; the error
 * is e(t) = r(t) − m(t − θ). Each step advances the states exactly (matrix exponential) for an
 * error that is the cubic Hermite interpolant of its end values and rates — the delayed
 * measurement and its rate are stored at every node, and the step divides θ, so both ends are
 * stored samples. The scheme is fourth order in the step. When θ is shorter than a step, the
 * error is taken linear within the step and its one unknown end value is solved for (second
 * order). The dead time is never replaced by a rational approximation.
 */
import { discretizeCubic, discretizeStates, type StateSpace } from './state-space';
import { discretizeModalCubic } from './modal';

/** The setpoint as a function of the time since the start, and its slope. */
export interface Reference {
  at: (x: number) => number;
  slope: (x: number) => number;
}

/** Known parts of z and m (and their rates) at every node, e.g. the response to a load. */
export interface Forcing {
  z: Float64Array;
  zRate: Float64Array;
  m: Float64Array;
  mRate: Float64Array;
}

/** z and dz/dt at the nodes 0, h, …, steps·h. */
export interface LoopHistory {
  z: Float64Array;
  zRate: Float64Array;
  h: number;
  steps: number;
}

/**
 * ss has outputs c[0] = z and c[1] = m; h divides θ when θ ≥ h. sensorGain is k when the
 * sensor's rational part is a constant (m = k·z, so one pair of dot products per step is spared).
 */
export function stepDelayedLoop(ss: StateSpace, h: number, steps: number, theta: number, r: Reference, forcing: Forcing | null, sensorGain: number | null): LoopHistory {
  const f = forcing ?? noForcing(steps);
  return theta >= h ? cubicSteps(ss, h, steps, Math.round(theta / h), r, f, sensorGain) : linearSteps(ss, h, steps, theta, r, f);
}

function noForcing(steps: number): Forcing {
  const zero = new Float64Array(steps + 1);
  return { z: zero, zRate: zero, m: zero, mRate: zero };
}

/** Row vector c·A and the scalar c·B: the rate of an output is c·A·x + c·B·e + d·de/dt. */
function rateRow(ss: StateSpace, c: Float64Array): { ca: Float64Array; cb: number } {
  const n = ss.n;
  const ca = new Float64Array(n);
  let cb = 0;
  for (let k = 0; k < n; k++) {
    cb += c[k] * ss.b[k];
    for (let j = 0; j < n; j++) ca[j] += c[k] * ss.a[k * n + j];
  }
  return { ca, cb };
}

/** θ ≥ h: the delayed measurement is the stored sample `lag` steps back. */
function cubicSteps(ss: StateSpace, h: number, steps: number, lag: number, r: Reference, f: Forcing, sensorGain: number | null): LoopHistory {
  const n = ss.n;
  const [cz, cm] = ss.c;
  const [dz, dm] = ss.d;
  const { ca: czA, cb: czB } = rateRow(ss, cz);
  const { ca: cmA, cb: cmB } = rateRow(ss, cm);
  const diagonal = ss.diagonal === true;
  // A modal realization's phi is its diagonal alone (length n).
  const { phi, ge0, ge1, gd0, gd1 } = diagonal ? discretizeModalCubic(ss, h) : discretizeCubic(ss, h);
  const z = new Float64Array(steps + 1), zRate = new Float64Array(steps + 1);
  const m = new Float64Array(steps + 1), mRate = new Float64Array(steps + 1);
  let x = new Float64Array(n), xn = new Float64Array(n);
  let e = r.at(0);
  let eRate = r.slope(0.5 * h);
  for (let i = 0; ; i++) {
    let zi = dz * e, zr = czB * e + dz * eRate;
    let mi = 0, mr = 0;
    if (sensorGain === null) {
      mi = dm * e;
      mr = cmB * e + dm * eRate;
      for (let k = 0; k < n; k++) {
        const xk = x[k];
        zi += cz[k] * xk;
        mi += cm[k] * xk;
        zr += czA[k] * xk;
        mr += cmA[k] * xk;
      }
    } else {
      for (let k = 0; k < n; k++) {
        const xk = x[k];
        zi += cz[k] * xk;
        zr += czA[k] * xk;
      }
      mi = sensorGain * zi;
      mr = sensorGain * zr;
    }
    zi += f.z[i]; zr += f.zRate[i];
    mi += f.m[i]; mr += f.mRate[i];
    z[i] = zi; m[i] = mi; zRate[i] = zr; mRate[i] = mr;
    if (i === steps) break;
    // Before the delayed start (node j ≤ 0 from the left) the measurement is still at rest.
    const j = i + 1 - lag;
    const rEnd = r.at((i + 1) * h);
    const slope = r.slope((i + 0.5) * h);
    const eEnd = j > 0 ? rEnd - m[j] : rEnd;
    const dEnd = (j > 0 ? slope - mRate[j] : slope) * h;
    const dStart = eRate * h;
    if (diagonal) {
      for (let a = 0; a < n; a++) xn[a] = phi[a] * x[a] + ge0[a] * e + ge1[a] * eEnd + gd0[a] * dStart + gd1[a] * dEnd;
    } else {
      for (let a = 0; a < n; a++) {
        const row = a * n;
        let s = ge0[a] * e + ge1[a] * eEnd + gd0[a] * dStart + gd1[a] * dEnd;
        for (let b = 0; b < n; b++) s += phi[row + b] * x[b];
        xn[a] = s;
      }
    }
    const swap = x; x = xn; xn = swap;
    const nextSlope = r.slope((i + 1.5) * h);
    e = j >= 0 ? rEnd - m[j] : rEnd;
    eRate = j >= 0 ? nextSlope - mRate[j] : nextSlope;
  }
  return { z, zRate, h, steps };
}

/** θ < h: m at (i+1)h − θ lies inside the step and depends on e((i+1)h) itself (linear, solved directly). */
function linearSteps(ss: StateSpace, h: number, steps: number, theta: number, r: Reference, f: Forcing): LoopHistory {
  const n = ss.n;
  const [cz, cm] = ss.c;
  const [dz, dm] = ss.d;
  const { ca: czA, cb: czB } = rateRow(ss, cz);
  const { phi, g0, g1 } = discretizeStates(ss, h);
  let cmg1 = dm;
  for (let k = 0; k < n; k++) cmg1 += cm[k] * g1[k];
  const alpha = 1 - theta / h;
  const z = new Float64Array(steps + 1), zRate = new Float64Array(steps + 1);
  let x = new Float64Array(n), xn = new Float64Array(n);
  const pred = new Float64Array(n);
  let e = r.at(0);
  let eRate = r.slope(0.5 * h);
  for (let i = 0; ; i++) {
    let zi = dz * e + f.z[i], mi = dm * e + f.m[i];
    let zr = czB * e + dz * eRate + f.zRate[i];
    for (let k = 0; k < n; k++) {
      zi += cz[k] * x[k];
      mi += cm[k] * x[k];
      zr += czA[k] * x[k];
    }
    z[i] = zi; zRate[i] = zr;
    if (i === steps) break;
    let beta = f.m[i + 1];
    for (let a = 0; a < n; a++) {
      const row = a * n;
      let s = g0[a] * e;
      for (let b = 0; b < n; b++) s += phi[row + b] * x[b];
      pred[a] = s;
      beta += cm[a] * s;
    }
    const eNext = (r.at((i + 1) * h) - (1 - alpha) * mi - alpha * beta) / (1 + alpha * cmg1);
    for (let a = 0; a < n; a++) xn[a] = pred[a] + g1[a] * eNext;
    const swap = x; x = xn; xn = swap;
    eRate = (eNext - e) / h;
    e = eNext;
  }
  return { z, zRate, h, steps };
}

/**
 * The output y(t) = z(t − delay) on the grid t (and its rate when asked), read between nodes by
 * cubic Hermite interpolation (dz/dt is known exactly at the nodes).
 */
export function readDelayed(hist: LoopHistory, t: readonly number[], delay: number, withRate: boolean): { y: number[]; rate: number[] | null } {
  const { z, zRate, h, steps } = hist;
  const count = t.length;
  const y = new Array<number>(count).fill(0);
  const rate = withRate ? new Array<number>(count).fill(0) : null;
  for (let k = 0; k < count; k++) {
    const tau = t[k] - t[0] - delay;
    if (tau < -1e-9 * h) continue;
    const p = Math.max(0, tau / h);
    const j = Math.floor(p);
    if (j >= steps) {
      y[k] = z[steps];
      if (rate) rate[k] = zRate[steps];
      continue;
    }
    const u = p - j;
    const u2 = u * u, u3 = u2 * u;
    y[k] = (2 * u3 - 3 * u2 + 1) * z[j] + (u3 - 2 * u2 + u) * h * zRate[j] + (3 * u2 - 2 * u3) * z[j + 1] + (u3 - u2) * h * zRate[j + 1];
    // Derivative of the Hermite cubic.
    if (rate) rate[k] = ((6 * u2 - 6 * u) * (z[j] - z[j + 1])) / h + (3 * u2 - 4 * u + 1) * zRate[j] + (3 * u2 - 2 * u) * zRate[j + 1];
  }
  return { y, rate };
}
