/**
 * Every applicable tuning rule for one model, side by side with the closed loop each one
 * predicts on that model: setpoint overshoot and settling time, Ms, gain and phase margins, and
 * IAE for a unit load step at the plant input, all from the engine's analyze() with the dead
 * time exact. An sopdt model is also tuned by the fopdt rules through Skogestad's half rule
 * (τ = τ1 + τ2/2, θ = θ + τ2/2); Ziegler–Nichols ultimate gain uses the model's own ultimate
 * point (Ku = gain margin of G, Pu = 2π/phase crossover). The figures are always of the true model.
 */
import { analyze } from '../analyze';
import { errorIntegrals } from '../error-integrals';
import { fromProcessModel } from '../process-model';
import { ModelError, type PidController, type ProcessModel } from '../types';
import { parseRequest } from '../request-error';
import { ruleCase, rangeCheck, tuningRules } from './rules';
import type { TuningRule } from './rule';
import { CompareRequestSchema, type CompareRequest, type TunedController, type TuningModel } from './schema';

/** Predicted closed-loop figures; null where undefined (e.g. an unstable loop). */
export interface PredictedLoop {
  stable: boolean;
  /** Setpoint step overshoot, % of the final value. */
  overshootPct: number | null;
  /** Setpoint step settling time (2 % band, from t = 0), s. */
  settlingTime: number | null;
  /** Peak sensitivity max |1/(1 + L)|. */
  ms: number;
  /** Gain margin as a ratio. */
  gainMargin: number | null;
  phaseMarginDeg: number | null;
  /** ∫|y| dt for a unit step load at the plant input, in y units·s. */
  loadIae: number | null;
}

export interface ComparisonRow {
  rule: TuningRule['id'];
  name: string;
  source: string;
  /** The model the rule was given: the input model, its half-rule fopdt, or its ultimate point. */
  tunedOn: TuningModel;
  /** How tunedOn was obtained from the input model. */
  via: 'model' | 'half-rule' | 'ultimate-point';
  controller: TunedController;
  /** θ/τ against the rule's stated range (true where the rule states none). */
  inRange: boolean;
  rangeNote: string;
  predicted: PredictedLoop;
}

export interface ComparisonSkip {
  rule: TuningRule['id'];
  /** Why this rule gives no settings here (one sentence). */
  reason: string;
}

export interface Comparison {
  rows: ComparisonRow[];
  skipped: ComparisonSkip[];
}

function halfRule(model: Extract<ProcessModel, { type: 'sopdt' }>): TuningModel {
  return { type: 'fopdt', k: model.k, tau: model.tau1 + model.tau2 / 2, theta: model.theta + model.tau2 / 2 };
}

/** The ultimate point of the model itself (of |G| for a reverse-acting process), or null if its phase never reaches −180°. */
function ultimatePoint(model: ProcessModel): TuningModel | null {
  const plant = fromProcessModel({ ...model, k: Math.abs(model.k) });
  const m = analyze({ plant, analyses: { margins: true } }).margins;
  if (!m || m.gainMargin === null || m.phaseCrossover === null) return null;
  return { type: 'ultimate', ku: m.gainMargin, pu: (2 * Math.PI) / m.phaseCrossover };
}

type Choice = { tunedOn: TuningModel; via: ComparisonRow['via'] } | { reason: string };

/** The model a rule is given for this input model, or why there is none. */
function choose(model: ProcessModel, rule: TuningRule, controller: 'pi' | 'pid'): Choice {
  const covers = (type: TuningModel['type']) => rule.cases.some((c) => c.model === type && c.controller === controller);
  if (covers(model.type)) return { tunedOn: model, via: 'model' };
  if (model.type === 'sopdt' && covers('fopdt')) return { tunedOn: halfRule(model), via: 'half-rule' };
  if (covers('ultimate')) {
    const point = ultimatePoint(model);
    if (point) return { tunedOn: point, via: 'ultimate-point' };
    return { reason: `${rule.name} needs an ultimate point, and this model's phase never reaches −180°.` };
  }
  return { reason: `${rule.name} has no ${controller.toUpperCase()} rule for a ${model.type} model.` };
}

function asPid(c: TunedController, n: number): PidController {
  return { form: c.form, kc: c.kc, ti: c.ti, td: c.td, n };
}

function predict(model: ProcessModel, controller: PidController): PredictedLoop {
  const plant = fromProcessModel(model);
  const loop = analyze({ plant, controller, analyses: { margins: true, poles: true } });
  const m = loop.margins!;
  const figures = { ms: m.ms, gainMargin: m.gainMargin, phaseMarginDeg: m.phaseMarginDeg };
  if (loop.stable !== true) return { stable: false, overshootPct: null, settlingTime: null, loadIae: null, ...figures };
  const setpoint = analyze({ plant, controller, analyses: { step: { input: 'setpoint' } } }).step!;
  const load = analyze({ plant, controller, analyses: { step: { input: 'load' } } }).step!;
  return {
    stable: true,
    overshootPct: setpoint.info.overshootPct,
    settlingTime: setpoint.info.settlingTime,
    loadIae: errorIntegrals(load.t, load.y).iae,
    ...figures,
  };
}

/**
 * Compares every rule that can tune this model for a PI or PID controller. Rules that cannot
 * (wrong model type, θ = 0 where a rule divides by θ) are listed in `skipped` with the reason.
 */
export function compareRules(input: CompareRequest | unknown): Comparison {
  const request = parseRequest(CompareRequestSchema, input);
  const { model, controller } = request;
  const options = request.options ?? {};
  const n = request.n ?? 10;
  const rows: ComparisonRow[] = [];
  const skipped: ComparisonSkip[] = [];
  for (const rule of tuningRules) {
    const choice = choose(model, rule, controller);
    if ('reason' in choice) {
      skipped.push({ rule: rule.id, reason: choice.reason });
      continue;
    }
    try {
      const { form } = ruleCase(rule, choice.tunedOn.type, controller);
      const settings = rule.design(choice.tunedOn, controller, options);
      // The ultimate point was taken of |G|: a reverse-acting process needs a negative kc.
      const sign = choice.via === 'ultimate-point' && model.k < 0 ? -1 : 1;
      const tuned: TunedController = { form, ...settings, kc: sign * settings.kc };
      rows.push({
        rule: rule.id,
        name: rule.name,
        source: rule.source,
        tunedOn: choice.tunedOn,
        via: choice.via,
        controller: tuned,
        inRange: rangeCheck(rule, choice.tunedOn).inRange,
        rangeNote: rule.range.note,
        predicted: predict(model, asPid(tuned, n)),
      });
    } catch (error) {
      if (!(error instanceof ModelError)) throw error;
      skipped.push({ rule: rule.id, reason: error.message });
    }
  }
  return { rows, skipped };
}
