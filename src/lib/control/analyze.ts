/**
 * analyze(request): the contract's POST /calc/analyze, as one pure function
 * (shared/api-v1.md). Bad values throw ModelError with a dotted field path into the request.
 */
import { ModelError, type Complex, type Margins, type PidController, type StepInfo, type TransferFunction } from './types';
import { createTransferFunction, type TransferFunctionInput } from './transfer-function';
import { pidToTransferFunction } from './pid';
import { chain } from './connect';
import { factor, autoGrid, frequencyResponse, timeScales, type FactoredModel, type FrequencyResponse } from './frequency';
import { margins } from './margins';
import { loopScan, seedScan } from './scan-grid';
import { closedLoopStable, characteristicPolynomial, openPathStable } from './stability';
import { sortRoots, roots } from './roots';
import { stepResponse } from './simulate';
import { closedLoopStep, closedLoopTransferFunction, type LoopInput } from './closed-loop';
import { degree } from './polynomial';
import { stepInfo } from './step-info';
import { timeGrid } from './time-grid';
import { horizonFromRoots, padeClosedLoopRoots } from './horizon';
import { checkAnalyses, type AnalysesRequest, type StepRequest } from './analyze-request';

export interface AnalyzeRequest {
  /** One transfer function, or several in series. */
  plant: TransferFunctionInput | TransferFunctionInput[];
  /** Measurement path H(s); default 1. */
  sensor?: TransferFunctionInput;
  controller?: PidController;
  analyses?: AnalysesRequest;
}

export interface AnalyzeResponse {
  step?: { t: number[]; y: number[]; info: StepInfo; tFinal: number };
  frequency?: FrequencyResponse;
  margins?: Margins;
  poles?: Complex[];
  zeros?: Complex[];
  stable?: boolean;
}

interface Setup {
  plant: TransferFunction;
  plantBlocks: TransferFunction[];
  sensor: TransferFunction;
  controller: TransferFunction | null;
  /** Blocks of L (or of G·H without a controller). */
  loopBlocks: TransferFunction[];
  loop: FactoredModel;
}

function setup(req: AnalyzeRequest): Setup {
  if (typeof req !== 'object' || req === null) throw new ModelError('The request must be a JSON object.', 'invalid_request');
  if (req.plant === undefined || req.plant === null) throw new ModelError('A plant transfer function is required.', 'invalid_model', 'plant');
  const list = Array.isArray(req.plant) ? req.plant : [req.plant];
  if (list.length === 0) throw new ModelError('The plant list is empty; give at least one transfer function.', 'invalid_model', 'plant');
  if (list.length > 20) throw new ModelError('At most 20 plant blocks can be connected in series.', 'invalid_model', 'plant');
  const plantBlocks = list.map((g, i) => createTransferFunction(g, { field: Array.isArray(req.plant) ? `plant.${i}` : 'plant' }));
  const sensor = req.sensor === undefined || req.sensor === null ? { num: [1], den: [1], delay: 0 } : createTransferFunction(req.sensor, { field: 'sensor' });
  let controller: TransferFunction | null = null;
  if (req.controller !== undefined && req.controller !== null) {
    if (typeof req.controller !== 'object') throw new ModelError('The controller must be an object with a form.', 'invalid_request', 'controller');
    controller = pidToTransferFunction(req.controller, 'controller');
  }
  const plant = chain(plantBlocks);
  const loopBlocks = [...(controller ? [controller] : []), ...plantBlocks, sensor];
  if (controller) checkProperLoop(controller, plant, sensor);
  return { plant, plantBlocks, sensor, controller, loopBlocks, loop: factor(loopBlocks) };
}

/**
 * An improper controller is accepted where the closed loop is proper: without dead time when
 * C·G/(1 + L) and G/(1 + L) are proper; with dead time in the loop only when C·G is proper
 * (otherwise the loop is of neutral type, with infinitely many unstable roots).
 */
function checkProperLoop(c: TransferFunction, g: TransferFunction, h: TransferFunction): void {
  const lRelDeg = degree(c.den) + degree(g.den) + degree(h.den) - degree(c.num) - degree(g.num) - degree(h.num);
  if (lRelDeg >= 0 || degree(g.num) === -Infinity) return;
  if (g.delay + h.delay > 0) {
    throw new ModelError('With dead time in the loop, an unfiltered derivative on this plant gives an improper loop; add a derivative filter (tf > 0 or n).', 'invalid_model', 'controller');
  }
  closedLoopTransferFunction({ controller: c, plant: g, sensor: h }, 'setpoint');
  closedLoopTransferFunction({ controller: c, plant: g, sensor: h }, 'load');
}

function constantTerm(p: readonly number[]): number {
  return p[p.length - 1];
}

/** Exact steady-state value of the analysed step response, or null when it has none. */
function finalValueOf(s: Setup, input: LoopInput, stable: boolean): number | null {
  if (!stable) return null;
  if (!s.controller) {
    return s.loopBlocks.reduce((acc, b) => acc * (constantTerm(b.num) / constantTerm(b.den)), 1);
  }
  const c = s.controller, g = s.plant, h = s.sensor;
  const char = constantTerm(characteristicPolynomial([c, g, h]));
  const num = input === 'setpoint' ? constantTerm(c.num) * constantTerm(g.num) * constantTerm(h.den) : constantTerm(g.num) * constantTerm(c.den) * constantTerm(h.den);
  const v = num / char;
  return v === 0 ? 0 : v;
}

function simulateStep(s: Setup, t: number[], input: LoopInput): number[] {
  if (!s.controller) return stepResponse(chain([s.plant, s.sensor]), t).y;
  // factor() lists the poles block by block, the sensor's last.
  const forwardPoles = s.loop.poles.slice(0, s.loop.poles.length - (s.sensor.den.length - 1));
  return closedLoopStep({ controller: s.controller, plant: s.plant, sensor: s.sensor }, t, input, { loopBandwidth: loopBandwidth(s.loop), forwardPoles }).y;
}

/** Highest scanned frequency where |L| ≥ ½ (rad/s); 0 when there is none. */
function loopBandwidth(m: FactoredModel): number {
  if (m.delay === 0) return 0;
  const scan = loopScan(m);
  for (let i = scan.w.length - 1; i >= 0; i--) if (scan.mag[i] >= 0.5) return scan.w[Math.min(i + 1, scan.w.length - 1)];
  return 0;
}

function estimatedHorizon(s: Setup, input: LoopInput): number {
  const scales = timeScales(s.loop);
  if (!s.controller) return horizonFromRoots(s.loop.poles, s.loop.delay, scales);
  const theta = s.loop.delay;
  const rootsCl = theta === 0 ? roots(characteristicPolynomial(s.loopBlocks)) : padeClosedLoopRoots(s.loopBlocks, theta);
  void input;
  return horizonFromRoots(rootsCl, s.plant.delay, scales);
}

/** Settled: the last fifth of the samples stays within 0.5 % of the final value (or of the peak for 0). */
function hasSettled(y: number[], finalValue: number): boolean {
  const ref = finalValue !== 0 ? Math.abs(finalValue) : Math.max(...y.map(Math.abs));
  const from = Math.floor(y.length * 0.8);
  for (let k = from; k < y.length; k++) if (Math.abs(y[k] - finalValue) > 0.005 * ref) return false;
  return true;
}

function runStep(s: Setup, req: StepRequest, stable: boolean): NonNullable<AnalyzeResponse['step']> {
  const input = s.controller ? req.input : 'setpoint';
  const finalValue = finalValueOf(s, input, stable);
  let tFinal = req.tFinal ?? estimatedHorizon(s, input);
  let t = timeGrid(tFinal, req.points);
  let y = simulateStep(s, t, input);
  // An automatic horizon for a growing response is shortened until the numbers stay finite.
  for (let i = 0; i < 20 && req.tFinal === undefined && y.some((v) => !Number.isFinite(v)); i++) {
    tFinal /= 4;
    t = timeGrid(tFinal, req.points);
    y = simulateStep(s, t, input);
  }
  if (req.tFinal === undefined && finalValue !== null) {
    for (let i = 0; i < 6 && !hasSettled(y, finalValue); i++) {
      tFinal *= 2;
      t = timeGrid(tFinal, req.points);
      y = simulateStep(s, t, input);
    }
  }
  if (y.some((v) => !Number.isFinite(v))) {
    throw new ModelError('The response grows beyond the range of numbers; shorten tFinal.', 'invalid_request', 'analyses.step.tFinal');
  }
  return { t, y, info: stepInfo(t, y, { finalValue }), tFinal };
}

/** The contract's /calc/analyze. */
export function analyze(req: AnalyzeRequest): AnalyzeResponse {
  const s = setup(req);
  const a = checkAnalyses(req.analyses);
  const out: AnalyzeResponse = {};
  let frequency: FrequencyResponse | null = null;
  if (a.frequency) {
    frequency = frequencyResponse(s.loop, a.frequency.w ?? autoGrid(s.loop, { points: a.frequency.points }));
    // A margin or stability scan, if one follows, reuses these values where the grid is dense enough.
    seedScan(s.loop, frequency);
  }
  const needStable = a.step !== null || a.poles;
  const stable = needStable ? (s.controller ? closedLoopStable(s.loopBlocks, s.loop) : openPathStable(s.loop)) : false;
  if (a.step) out.step = runStep(s, a.step, stable);
  if (frequency) out.frequency = frequency;
  if (a.margins) out.margins = margins(s.loop);
  if (a.poles) {
    out.poles = sortRoots(s.loop.poles.map((p) => ({ ...p })));
    out.zeros = sortRoots(s.loop.zeros.map((z) => ({ ...z })));
    out.stable = stable;
  }
  return out;
}
