/** The published rules as data, and tuning without request validation (zod-free, for islands). */
import { ModelError } from '../types';
import { amigo } from './amigo';
import { cohenCoon } from './cohen-coon';
import { imc } from './imc';
import { lambda } from './lambda';
import type { RuleCase, TuningRule } from './rule';
import type { ControllerKind, RuleId, TuneOptions, TuneResult, TuningModel } from './schema';
import { simc } from './simc';
import { zieglerNicholsOpenLoop, zieglerNicholsUltimate } from './ziegler-nichols';

export type { RuleCase, RuleRange, TuningRule } from './rule';

/** Every rule, in the order the product lists them. */
export const tuningRules: readonly TuningRule[] = [
  simc,
  lambda,
  imc,
  zieglerNicholsOpenLoop,
  zieglerNicholsUltimate,
  cohenCoon,
  amigo,
];

export function ruleById(id: RuleId): TuningRule {
  const rule = tuningRules.find((r) => r.id === id);
  if (!rule) throw new ModelError(`Unknown tuning rule "${id}".`, 'invalid_request', 'rule');
  return rule;
}

/** The case of `rule` for this model type and controller, or a ModelError naming what to change. */
export function ruleCase(rule: TuningRule, modelType: TuningModel['type'], controller: 'pi' | 'pid'): RuleCase {
  const forModel = rule.cases.filter((c) => c.model === modelType);
  if (forModel.length === 0) {
    const types = [...new Set(rule.cases.map((c) => c.model))].join(' or ');
    throw new ModelError(`${rule.name} tunes ${types} models, not ${modelType}.`, 'invalid_request', 'model.type');
  }
  const match = forModel.find((c) => c.controller === controller);
  if (!match) {
    const kinds = forModel.map((c) => c.controller.toUpperCase()).join(' or ');
    throw new ModelError(
      `${rule.name} gives ${kinds} settings for a ${modelType} model; ask for that controller.`,
      'invalid_request',
      'controller',
    );
  }
  return match;
}

/** Rules that cover this model type and controller. */
export function applicableRules(modelType: TuningModel['type'], controller: 'pi' | 'pid'): TuningRule[] {
  return tuningRules.filter((r) => r.cases.some((c) => c.model === modelType && c.controller === controller));
}

/** Whether θ/τ lies in the rule's stated range; null ratio for models without one. */
export function rangeCheck(rule: TuningRule, model: TuningModel): { thetaOverTau: number | null; inRange: boolean } {
  const ratio =
    model.type === 'fopdt' ? model.theta / model.tau : model.type === 'sopdt' ? model.theta / model.tau1 : null;
  const bounds = rule.range.thetaOverTau;
  if (ratio === null || bounds === null) return { thetaOverTau: ratio, inRange: true };
  const aboveMin = bounds.min === null || ratio >= bounds.min;
  const belowMax = bounds.max === null || ratio <= bounds.max;
  return { thetaOverTau: ratio, inRange: aboveMin && belowMax };
}

/** Settings of one rule for an already valid model; ModelError where the combination does not apply. */
export function designController(
  model: TuningModel,
  ruleId: RuleId,
  controller: ControllerKind,
  options: TuneOptions = {},
): TuneResult {
  const rule = ruleById(ruleId);
  const { form } = ruleCase(rule, model.type, controller);
  for (const key of Object.keys(options) as (keyof TuneOptions)[]) {
    if (options[key] !== undefined && !rule.options.includes(key)) {
      const takes = rule.options.length > 0 ? `it takes ${rule.options.join(', ')}` : 'it takes no options';
      throw new ModelError(`${rule.name} does not use options.${key}; ${takes}.`, 'invalid_request', `options.${key}`);
    }
  }
  const settings = rule.design(model, controller, options);
  for (const [key, value] of Object.entries(settings)) {
    if (!Number.isFinite(value)) {
      throw new ModelError(`${rule.name} gives no finite ${key} for this model.`, 'invalid_request', 'model');
    }
  }
  return { controller: { form, ...settings }, rule: rule.id, source: rule.source };
}
