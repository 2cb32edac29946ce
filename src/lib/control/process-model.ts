/** The trade's low-order models as transfer functions. */
import { ModelError, type ProcessModel, type TransferFunction } from './types';

function positive(value: number, field: string, what: string, allowZero = false): void {
  if (!Number.isFinite(value) || value < 0 || (!allowZero && value === 0)) {
    throw new ModelError(`${what} must be a finite number ${allowZero ? 'of zero or more' : 'above zero'}.`, 'invalid_model', field);
  }
}

/**
 * FOPDT K·e^(−θs)/(τs+1), SOPDT K·e^(−θs)/((τ1s+1)(τ2s+1)), IPDT K·e^(−θs)/s.
 * Times in s; K a plain ratio (for IPDT in 1/s).
 */
export function fromProcessModel(model: ProcessModel): TransferFunction {
  if (!Number.isFinite(model.k) || model.k === 0) {
    throw new ModelError('The process gain k must be a finite, non-zero number.', 'invalid_model', 'k');
  }
  positive(model.theta, 'theta', 'The dead time theta', true);
  switch (model.type) {
    case 'fopdt':
      positive(model.tau, 'tau', 'The time constant tau', true);
      return { num: [model.k], den: model.tau === 0 ? [1] : [model.tau, 1], delay: model.theta };
    case 'sopdt': {
      positive(model.tau1, 'tau1', 'The time constant tau1', true);
      positive(model.tau2, 'tau2', 'The time constant tau2', true);
      const den = [model.tau1 * model.tau2, model.tau1 + model.tau2, 1];
      while (den.length > 1 && den[0] === 0) den.shift();
      return { num: [model.k], den, delay: model.theta };
    }
    case 'ipdt':
      return { num: [model.k], den: [1, 0], delay: model.theta };
    default:
      throw new ModelError('The model type must be fopdt, sopdt or ipdt.', 'invalid_model', 'type');
  }
}
