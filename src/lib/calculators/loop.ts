/**
 * The loop-response calculator's figures from the engine: the closed-loop setpoint and load
 * steps on one horizon, the margins of L, IAE of each step, and the claim figures. A thin
 * adapter over `analyze`, so islands import one function and stay out of the engine's inside.
 */
import { analyze } from '../control/analyze';
import { errorIntegrals } from '../control/error-integrals';
import { fromProcessModel } from '../control/process-model';
import type { Margins, StepInfo, TransferFunction } from '../control/types';
import type { PidControllerInput } from '../schemas/controller';
import type { ProcessModelInput } from '../schemas/process-model';
import type { TransferFunctionInput } from '../schemas/transfer-function';
import type { LoopFigures } from './claims';

/** Samples per step response: enough for smooth curves and interpolated crossing times. */
export const LOOP_POINTS = 601;

export interface LoopRequest {
  model: ProcessModelInput;
  controller: PidControllerInput;
  sensor?: TransferFunctionInput;
  /** Horizon in s; chosen by the engine so the setpoint step settles when absent. */
  tFinal?: number;
  points?: number;
}

export interface StepResult {
  t: number[];
  y: number[];
  info: StepInfo;
  /** ∫|error| dt: of 1 − y for the setpoint step, of y for the load step; s. */
  iae: number;
}

export interface LoopResult {
  setpoint: StepResult;
  load: StepResult;
  margins: Margins;
  /** Whether the closed loop is asymptotically stable (dead time exact). */
  stable: boolean;
  /** The horizon both steps share, s. */
  tFinal: number;
  figures: LoopFigures;
}

/** The plant of a recipe's model as a transfer function. */
export function modelToTf(model: ProcessModelInput): TransferFunction {
  if (model.type === 'tf') return { num: [...model.num], den: [...model.den], delay: model.delay ?? 0 };
  return fromProcessModel(model);
}

function figuresOf(step: StepResult): LoopFigures['setpoint'] {
  const { overshootPct, riseTime, settlingTime, peak } = step.info;
  return { overshootPct, riseTime, settlingTime, peak, iae: step.iae };
}

/** Setpoint and load steps, margins and claim figures of the loop C·G·H. */
export function analyzeLoop(request: LoopRequest): LoopResult {
  const plant = modelToTf(request.model);
  const points = request.points ?? LOOP_POINTS;
  const base = { plant, sensor: request.sensor, controller: request.controller };
  const sp = analyze({ ...base, analyses: { step: { tFinal: request.tFinal, points, input: 'setpoint' }, margins: true, poles: true } });
  const tFinal = sp.step!.tFinal;
  const ld = analyze({ ...base, analyses: { step: { tFinal, points, input: 'load' } } });
  const setpointStep = sp.step!;
  const loadStep = ld.step!;
  const setpoint: StepResult = {
    t: setpointStep.t,
    y: setpointStep.y,
    info: setpointStep.info,
    iae: errorIntegrals(setpointStep.t, setpointStep.y.map((v) => 1 - v)).iae,
  };
  const load: StepResult = { t: loadStep.t, y: loadStep.y, info: loadStep.info, iae: errorIntegrals(loadStep.t, loadStep.y).iae };
  const m = sp.margins!;
  const stable = sp.stable ?? false;
  return {
    setpoint,
    load,
    margins: m,
    stable,
    tFinal,
    figures: {
      setpoint: figuresOf(setpoint),
      load: figuresOf(load),
      phaseMarginDeg: m.phaseMarginDeg,
      gainMargin: m.gainMargin,
      delayMargin: m.delayMargin,
      ms: stable ? m.ms : null,
      mt: stable ? m.mt : null,
    },
  };
}
