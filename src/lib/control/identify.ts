/**
 * Process models from an open-loop step test (POST /api/v1/calc/identify): FOPDT, SOPDT and
 * IPDT fitted by Levenberg–Marquardt least squares (ml-levenberg-marquardt) from graphical
 * starting points. y may start at any steady level (the offset is fitted too); the dead time is
 * measured from the step instant; k is per unit of the u step (for IPDT the slope gain, 1/s).
 * The fit runs on scaled data (time by the post-step span, y by its spread) so that every
 * parameter is of order one, which the optimizer's plain damping needs.
 */
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { baseline, rampGuess, secondOrderGuesses, twoPointGuess } from './identify-guess';
import { fopdtStep, fopdtStepGradient, ipdtStep, ipdtStepGradient, sopdtStep, sopdtStepGradient } from './identify-models';
import { fitWarnings } from './identify-warnings';
import { IdentifyRequestSchema, readStepTest, type IdentifyRequest, type StepTest } from './identify-step';
import { ModelError, type ProcessModel } from './types';

export { IdentifyRequestSchema, type IdentifyRequest };

export interface IdentifyResult {
  model: ProcessModel;
  /** rmse in y units; r2 = 1 − SSres/SStot of the fit over all samples. */
  fit: { rmse: number; r2: number };
  /** Cautions in plain sentences (empty when none): short record, dead time at the edge, poor match. */
  warnings: string[];
}

/** Unit step response of a model at scaled time x for scaled time parameters, and its gradient. */
interface Shape {
  value(x: number, times: number[]): number;
  gradient(x: number, times: number[]): number[];
}

interface Candidate {
  shape: Shape;
  /** Initial scaled time parameters (τ…, θ last). */
  times: number[];
  gain: number;
}

interface Scaled {
  x: number[];
  y: number[];
  span: number;
  spread: number;
  y0: number;
}

/** Samples the optimizer sees at most; longer records are thinned evenly (quality uses all). */
const FIT_SAMPLES = 1500;

function scale(test: StepTest): Scaled {
  const span = test.t[test.t.length - 1] - test.stepTime;
  const y0 = baseline(test);
  const mean = test.y.reduce((a, b) => a + b, 0) / test.y.length;
  const spread = Math.sqrt(test.y.reduce((a, v) => a + (v - mean) ** 2, 0) / test.y.length) || 1;
  const stride = Math.ceil(test.t.length / FIT_SAMPLES);
  const keep = test.t.map((_, i) => i).filter((i) => i % stride === 0);
  return {
    x: keep.map((i) => (test.t[i] - test.stepTime) / span),
    y: keep.map((i) => (test.y[i] - y0) / spread),
    span,
    spread,
    y0,
  };
}

function sumSquares(data: Scaled, f: (x: number) => number): number {
  let sum = 0;
  for (let i = 0; i < data.x.length; i++) sum += (data.y[i] - f(data.x[i])) ** 2;
  return sum;
}

/**
 * LM from a candidate, parameters [gain, ...times, offset], in rounds of 25 iterations until a
 * round improves the sum of squares by less than 1e-9 (relative) or `rounds` are done: the
 * optimizer itself only stops at an absolute error, which noisy data never reach.
 */
function fitFrom(data: Scaled, c: Candidate, start: number[], rounds: number): { params: number[]; sse: number } {
  const model = (p: number[]) => {
    const times = p.slice(1, -1);
    return (x: number) => p[0] * c.shape.value(x, times) + p[p.length - 1];
  };
  // ∂/∂gain = shape, ∂/∂times = gain·∂shape, ∂/∂offset = 1.
  const jacobian = (p: number[]) => {
    const times = p.slice(1, -1);
    return (x: number) => [c.shape.value(x, times), ...c.shape.gradient(x, times).map((g) => p[0] * g), 1];
  };
  const n = c.times.length;
  const bounds = {
    minValues: [-1e9, ...new Array<number>(n - 1).fill(1e-6), 0, -1e3],
    maxValues: [1e9, ...new Array<number>(n - 1).fill(1e3), 0.95, 1e3],
  };
  let params = start;
  let sse = sumSquares(data, model(params));
  for (let round = 0; round < rounds; round++) {
    const result = levenbergMarquardt({ x: data.x, y: data.y }, model, {
      ...bounds,
      initialValues: params,
      jacobianFunction: jacobian,
      damping: 1e-2,
      maxIterations: 25,
      errorTolerance: 1e-14,
    });
    const next = sumSquares(data, model(result.parameterValues));
    if (!(next <= sse)) break;
    const gained = sse - next;
    params = result.parameterValues;
    sse = next;
    if (gained <= 1e-9 * sse) break;
  }
  return { params, sse };
}

/** Screens every start with one round, then polishes the best one. */
function best(data: Scaled, candidates: Candidate[]): number[] {
  let winner: { params: number[]; sse: number; candidate: Candidate } | null = null;
  for (const c of candidates) {
    const run = fitFrom(data, c, [c.gain, ...c.times, 0], 1);
    if (Number.isFinite(run.sse) && (winner === null || run.sse < winner.sse)) winner = { ...run, candidate: c };
  }
  if (!winner) throw new ModelError('The step test could not be fitted; check that y responds to the step.', 'invalid_request', 'y');
  return fitFrom(data, winner.candidate, winner.params, 12).params;
}

const fopdtShape: Shape = {
  value: (x, [tau, theta]) => fopdtStep(x, tau, theta),
  gradient: (x, [tau, theta]) => fopdtStepGradient(x, tau, theta),
};
const sopdtShape: Shape = {
  value: (x, [tau1, tau2, theta]) => sopdtStep(x, tau1, tau2, theta),
  gradient: (x, [tau1, tau2, theta]) => sopdtStepGradient(x, tau1, tau2, theta),
};
const ipdtShape: Shape = {
  value: (x, [theta]) => ipdtStep(x, theta),
  gradient: (x, [theta]) => ipdtStepGradient(x, theta),
};

function fitModel(test: StepTest, type: IdentifyRequest['model'], data: Scaled): ProcessModel {
  const { span, spread } = data;
  const perUnit = spread / test.stepSize;
  if (type === 'ipdt') {
    const g = rampGuess(test);
    const p = best(data, [{ shape: ipdtShape, times: [g.theta / span], gain: (g.k * test.stepSize * span) / spread }]);
    return { type: 'ipdt', k: (p[0] * perUnit) / span, theta: p[1] * span };
  }
  const g = twoPointGuess(test);
  const gain = (g.k * test.stepSize) / spread;
  const fopdtStarts: Candidate[] = [
    { shape: fopdtShape, times: [g.tau / span, g.theta / span], gain },
    { shape: fopdtShape, times: [g.tau / span, (g.theta / span) * 0.5], gain },
  ];
  if (type === 'fopdt') {
    const p = best(data, fopdtStarts);
    return { type: 'fopdt', k: p[0] * perUnit, tau: p[1] * span, theta: p[2] * span };
  }
  const starts = secondOrderGuesses(g).map((s) => ({
    shape: sopdtShape,
    times: [s.tau1 / span, s.tau2 / span, s.theta / span],
    gain,
  }));
  const p = best(data, starts);
  const [tau1, tau2] = p[1] >= p[2] ? [p[1], p[2]] : [p[2], p[1]];
  return { type: 'sopdt', k: p[0] * perUnit, tau1: tau1 * span, tau2: tau2 * span, theta: p[3] * span };
}

/** The model's response at each sample of the test, in y units, from the fitted level. */
function predict(model: ProcessModel, test: StepTest, y0: number): number[] {
  return test.t.map((t) => {
    const x = t - test.stepTime;
    const unit =
      model.type === 'fopdt'
        ? fopdtStep(x, model.tau, model.theta)
        : model.type === 'sopdt'
          ? sopdtStep(x, model.tau1, model.tau2, model.theta)
          : ipdtStep(x, model.theta);
    return y0 + model.k * test.stepSize * unit;
  });
}

function quality(y: number[], fitted: number[]): IdentifyResult['fit'] {
  const mean = y.reduce((a, b) => a + b, 0) / y.length;
  let ssRes = 0;
  let ssTot = 0;
  for (let i = 0; i < y.length; i++) {
    ssRes += (y[i] - fitted[i]) ** 2;
    ssTot += (y[i] - mean) ** 2;
  }
  return { rmse: Math.sqrt(ssRes / y.length), r2: ssTot > 0 ? 1 - ssRes / ssTot : ssRes === 0 ? 1 : 0 };
}

/** Fits the requested model to a step test; validates the request (ModelError naming the field). */
export function identify(input: IdentifyRequest | unknown): IdentifyResult {
  const { test, model: type } = readStepTest(input);
  if (Math.max(...test.y) === Math.min(...test.y)) {
    throw new ModelError('y never changes, so there is no response to fit; check the recorded tag.', 'invalid_request', 'y');
  }
  const data = scale(test);
  const model = fitModel(test, type, data);
  if (!(model.k !== 0 && Number.isFinite(model.k))) {
    throw new ModelError('y shows no response to the step in u; check the recorded tags and the test length.', 'invalid_request', 'y');
  }
  // The offset is fitted in scaled units; recover it by the best level for the fitted shape.
  const shapeOnly = predict(model, test, 0);
  const level = test.y.reduce((a, v, i) => a + (v - shapeOnly[i]), 0) / test.y.length;
  const fit = quality(test.y, predict(model, test, level));
  return { model, fit, warnings: fitWarnings(model, test, fit.r2) };
}
