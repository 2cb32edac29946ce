/**
 * Fits FOPDT, SOPDT and IPDT models to a stored step test with the engine's identify, and
 * computes each fitted curve and its residuals for the plots.
 */
import { identify } from '../control/identify';
import { fopdtStep, ipdtStep, sopdtStep } from '../control/identify-models';
import { readStepTest } from '../control/identify-step';
import { ModelError, type ProcessModel } from '../control/types';
import type { StepSeries } from './csv';
import { decimateIndices, pick } from './decimate';

export const MODEL_TYPES = ['fopdt', 'sopdt', 'ipdt'] as const;
export type ModelType = (typeof MODEL_TYPES)[number];

/** Samples handed to the optimizer (thinned evenly beyond this; the fit takes seconds, not minutes). */
export const FIT_SAMPLES = 2000;
/** Samples sent to the browser for plotting. */
export const PLOT_SAMPLES = 1500;

/** One model's result: the model and its quality, or why it could not be fitted. */
export type ModelFit =
  | { type: ModelType; model: ProcessModel; fit: { rmse: number; r2: number }; error: null }
  | { type: ModelType; model: null; fit: null; error: string };

/** The series as the plots show it: thinned, with each fit's curve and residuals on the same times. */
export interface FitPlot {
  t: number[];
  pv: number[];
  co: number[] | null;
  curves: { type: ModelType; fitId: number | null; y: number[]; residual: number[] }[];
}

/** Fits each requested model; a model that cannot be fitted reports its error instead of failing all. */
export function fitSeries(series: StepSeries, types: readonly ModelType[] = MODEL_TYPES): ModelFit[] {
  const input = fitInput(series);
  return types.map((type): ModelFit => {
    try {
      const r = identify({ ...input, model: type });
      return { type, model: r.model, fit: r.fit, error: null };
    } catch (err) {
      if (err instanceof ModelError) return { type, model: null, fit: null, error: err.message };
      throw err;
    }
  });
}

/** The samples the optimizer sees: the series thinned to FIT_SAMPLES. */
function fitInput(series: StepSeries): { t: number[]; y: number[]; u: number[] | undefined } {
  const idx = decimateIndices(series.t.length, FIT_SAMPLES, series.co);
  return { t: pick(series.t, idx), y: pick(series.pv, idx), u: series.co ? pick(series.co, idx) : undefined };
}

/** The thinned series with every fitted model's curve and residual (y − fit). */
export function fitPlot(series: StepSeries, fits: { type: ModelType; model: ProcessModel; id?: number }[]): FitPlot {
  const idx = decimateIndices(series.t.length, PLOT_SAMPLES, series.co);
  const t = pick(series.t, idx);
  const pv = pick(series.pv, idx);
  const co = series.co ? pick(series.co, idx) : null;
  const curves = fits.map(({ type, model, id }) => {
    const y = modelCurve(series, model, t);
    return { type, fitId: id ?? null, y, residual: y.map((v, i) => pv[i] - v) };
  });
  return { t, pv, co, curves };
}

/**
 * The model's response to the test's step at times `at`, from the level that fits best (the
 * mean of y minus the step shape over the fitted samples, as identify does).
 */
export function modelCurve(series: StepSeries, model: ProcessModel, at: number[]): number[] {
  const input = fitInput(series);
  const { test } = readStepTest({ ...input, model: model.type });
  const shape = (t: number) => model.k * test.stepSize * unitStep(model, t - test.stepTime);
  let sum = 0;
  for (let i = 0; i < input.t.length; i++) sum += input.y[i] - shape(input.t[i]);
  const level = sum / input.t.length;
  return at.map((t) => level + shape(t));
}

function unitStep(model: ProcessModel, x: number): number {
  if (model.type === 'fopdt') return fopdtStep(x, model.tau, model.theta);
  if (model.type === 'sopdt') return sopdtStep(x, model.tau1, model.tau2, model.theta);
  return ipdtStep(x, model.theta);
}
