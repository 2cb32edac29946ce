import type { ControllerKind, RuleId, TunedController, TuningModel, TuneOptions } from './schema';

export type ModelType = TuningModel['type'];

/** One model/controller combination a rule covers, and the form its answer is in. */
export interface RuleCase {
  model: ModelType;
  controller: ControllerKind;
  form: TunedController['form'];
}

/** Where a rule is meant to be used, as data (ratios are plain numbers, null = no bound). */
export interface RuleRange {
  /** Bounds on θ/τ (θ/τ1 for sopdt); null where the rule states none. */
  thetaOverTau: { min: number | null; max: number | null } | null;
  /** One sentence on where the rule applies and where the bounds come from. */
  note: string;
}

/** A published tuning rule: its source, the cases it covers, and its formulas. */
export interface TuningRule {
  id: RuleId;
  /** Display name. */
  name: string;
  /** The publication the formulas come from. */
  source: string;
  cases: RuleCase[];
  /** The options the rule reads (tauC, lambda); any other option is refused. */
  options: readonly (keyof TuneOptions)[];
  range: RuleRange;
  /** kc, ti, td (s) for a model and controller already known to be one of `cases`. */
  design(model: TuningModel, controller: ControllerKind, options: TuneOptions): Omit<TunedController, 'form'>;
}
