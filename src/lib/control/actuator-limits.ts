/**
 * A loop whose controller output saturates (a valve at 0–100 %), simulated as the digital
 * controller a PLC runs, with a fine fixed step h: parallel-form PID on the error with the
 * derivative filtered (backward Euler), output clamped to [min, max], and anti-windup by
 * back-calculation (Åström & Hägglund, Advanced PID Control, 2006, §3.5: the integrator is fed
 * (u − v)/Tt) or by conditional integration (the integrator holds while the output is saturated
 * and the error would drive it further). Plant input is held over each step (zero-order hold, as
 * a PLC output card does); dead times are whole steps (h divides the plant dead time exactly and
 * the sensor's to within h/2). Signals are deviations from rest; `bias` is the output at rest.
 */
import { ModelError, type PidController, type TransferFunction } from './types';
import { toParallel } from './pid-forms';
import { discretizeStates, toStateSpace, type StateSpace } from './state-space';
import { gridStep } from './time-grid';

export type AntiWindup = 'back-calculation' | 'conditional' | 'none';

export interface LimitedLoopRequest {
  controller: PidController;
  plant: TransferFunction;
  sensor?: TransferFunction;
  /** Evenly spaced output times (s). */
  t: readonly number[];
  /** Setpoint step size (engineering units of y); default 1. */
  setpoint?: number;
  /** Load step added to the plant input (units of u); default 0. */
  load?: number;
  /** Controller output limits (units of u, e.g. 0 and 100 %). */
  limits: { min: number; max: number };
  /** Controller output at rest (units of u); default 0. */
  bias?: number;
  antiWindup?: AntiWindup;
  /** Back-calculation tracking time (s); default √(ti·td), or ti/2 without derivative. */
  trackingTime?: number;
  /** Least number of internal steps; default 4000. */
  minSteps?: number;
}

export interface LimitedLoopResponse {
  t: number[];
  /** Process value (deviation from rest). */
  y: number[];
  /** Controller output after the limits (absolute, bias included). */
  u: number[];
  /** Fraction of the time the output sat on a limit. */
  saturatedFraction: number;
}

interface Block { ss: StateSpace; phi: Float64Array; gamma: Float64Array; x: Float64Array }

function block(g: TransferFunction, h: number): Block {
  const ss = toStateSpace({ num: g.num, den: g.den, delay: 0 });
  const d = discretizeStates(ss, h);
  return { ss, phi: d.phi, gamma: d.g0.map((v, i) => v + d.g1[i]), x: new Float64Array(ss.n) };
}

function out(b: Block, u: number): number {
  let s = b.ss.d[0] * u;
  for (let i = 0; i < b.ss.n; i++) s += b.ss.c[0][i] * b.x[i];
  return s;
}

function advance(b: Block, u: number): void {
  const n = b.ss.n;
  const next = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b.gamma[i] * u;
    for (let j = 0; j < n; j++) s += b.phi[i * n + j] * b.x[j];
    next[i] = s;
  }
  b.x = next;
}

export function simulateLimitedLoop(req: LimitedLoopRequest): LimitedLoopResponse {
  const { min, max } = req.limits;
  if (!(Number.isFinite(min) && Number.isFinite(max) && min < max)) {
    throw new ModelError('The output limits need a finite min below a finite max.', 'invalid_request', 'limits');
  }
  const pid = toParallel(req.controller);
  if (!pid) throw new ModelError('This controller has no parallel form to run.', 'invalid_request', 'controller');
  const kp = pid.kp, ki = pid.ki ?? 0, kd = pid.kd ?? 0, tf = pid.tf ?? 0;
  const ideal = req.controller.form === 'parallel' ? null : req.controller;
  const ti = ki !== 0 ? kp / ki : 0;
  const td = ideal?.td ?? (kp !== 0 ? kd / kp : 0);
  const tt = req.trackingTime ?? (td > 0 && ti > 0 ? Math.sqrt(ti * td) : ti > 0 ? ti / 2 : 1);
  const bias = req.bias ?? 0;
  const sensor = req.sensor ?? { num: [1], den: [1], delay: 0 };
  const dt = gridStep(req.t);
  const span = req.t[req.t.length - 1] - req.t[0];
  let h = span / (req.minSteps ?? 4000);
  const thetaG = req.plant.delay;
  if (thetaG >= h) h = thetaG / Math.ceil(thetaG / h - 1e-9);
  const steps = Math.ceil(span / h - 1e-9);
  const dg = Math.round(thetaG / h);
  const dh = Math.round(sensor.delay / h);
  const plant = block(req.plant, h);
  const meas = block(sensor, h);
  const r = req.setpoint ?? 1;
  const load = req.load ?? 0;
  const mode = req.antiWindup ?? 'back-calculation';
  const uHist = new Float64Array(steps + 1);
  const yHist = new Float64Array(steps + 1);
  let integral = 0, deriv = 0, ePrev = 0, saturated = 0;
  const heldInput = (k: number) => (k - dg >= 0 ? uHist[k - dg] : bias) - bias + load;
  for (let k = 0; k <= steps; k++) {
    // The process value is sampled before the controller acts; a direct feedthrough without dead
    // time sees the output held from the previous step.
    yHist[k] = out(plant, heldInput(dg > 0 ? k : k - 1));
    const yDelayed = k - dh >= 0 ? yHist[k - dh] : 0;
    const ym = out(meas, yDelayed);
    const e = r - ym;
    deriv = tf + h > 0 ? (tf * deriv + kd * (e - ePrev)) / (tf + h) : 0;
    const v = bias + kp * e + integral + deriv;
    const u = Math.min(max, Math.max(min, v));
    if (u !== v) saturated++;
    uHist[k] = u;
    const q = heldInput(k);
    if (mode === 'back-calculation') integral += h * (ki * e + (u - v) / tt);
    else if (mode === 'conditional') {
      const pushing = (v > max && e * ki > 0) || (v < min && e * ki < 0);
      if (!pushing) integral += h * ki * e;
    } else integral += h * ki * e;
    ePrev = e;
    advance(plant, q);
    advance(meas, yDelayed);
  }
  const at = (hist: Float64Array, tk: number, hold: boolean) => {
    const f = (tk - req.t[0]) / h;
    const j = Math.min(Math.floor(f + 1e-9), steps);
    if (hold || j >= steps) return hist[j];
    return hist[j] + (f - j) * (hist[j + 1] - hist[j]);
  };
  void dt;
  return {
    t: [...req.t],
    y: req.t.map((tk) => at(yHist, tk, false)),
    u: req.t.map((tk) => at(uHist, tk, true)),
    saturatedFraction: saturated / (steps + 1),
  };
}
