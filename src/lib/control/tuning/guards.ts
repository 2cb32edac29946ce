import { ModelError } from '../types';
import type { TuningModel } from './schema';

type FirstOrder = Extract<TuningModel, { type: 'fopdt' }>;
type Ultimate = Extract<TuningModel, { type: 'ultimate' }>;

/** Rules whose formulas divide by θ need a dead time; say so rather than answer Infinity. */
export function requireDeadTime(theta: number, ruleName: string): number {
  if (!(theta > 0)) {
    throw new ModelError(
      `${ruleName} divides by the dead time: give a model with theta > 0 s.`,
      'invalid_request',
      'model.theta',
    );
  }
  return theta;
}

function wrongModel(expected: string): never {
  throw new ModelError(`This rule needs a ${expected} model.`, 'invalid_request', 'model.type');
}

export function asFopdt(model: TuningModel): FirstOrder {
  return model.type === 'fopdt' ? model : wrongModel('fopdt');
}
export function asUltimate(model: TuningModel): Ultimate {
  return model.type === 'ultimate' ? model : wrongModel('ultimate');
}
