import { ModelError } from '../types';
import type { TuningRule } from './rule';
import type { TuningModel, TuneOptions } from './schema';

/**
 * SIMC (Skogestad 2003, J. Process Control 13:291–309), with τc the desired closed-loop time
 * constant (default θ, "tight control"):
 * - fopdt PI:  kc = τ/(K(τc+θ)),  ti = min(τ, 4(τc+θ))
 * - sopdt PID (series form): kc = τ1/(K(τc+θ)), ti = min(τ1, 4(τc+θ)), td = τ2
 * - ipdt PI:   kc = 1/(K'(τc+θ)),  ti = 4(τc+θ)   (K' the slope gain)
 * Written from memory of the paper; its half-rule example and margin figures are checked in tests.
 */
function closedLoopHorizon(model: TuningModel, options: TuneOptions): number {
  const theta = 'theta' in model ? model.theta : 0;
  const tauC = options.tauC ?? theta;
  if (!(tauC + theta > 0)) {
    throw new ModelError(
      'SIMC with the default tauC = theta needs theta > 0 s; give options.tauC for a model without dead time.',
      'invalid_request',
      'options.tauC',
    );
  }
  return tauC + theta;
}

export const simc: TuningRule = {
  id: 'simc',
  name: 'SIMC',
  source: 'Skogestad, S. (2003). Simple analytic rules for model reduction and PID controller tuning. J. Process Control 13, 291–309.',
  cases: [
    { model: 'fopdt', controller: 'pi', form: 'ideal' },
    { model: 'sopdt', controller: 'pid', form: 'series' },
    { model: 'ipdt', controller: 'pi', form: 'ideal' },
  ],
  options: ['tauC'],
  range: {
    thetaOverTau: null,
    note: 'Any θ/τ; τc = θ gives tight control (Ms about 1.6–1.7 per the paper), a larger τc smoother and more robust control.',
  },
  design(model, _controller, options) {
    const h = closedLoopHorizon(model, options);
    switch (model.type) {
      case 'fopdt':
        return { kc: model.tau / (model.k * h), ti: Math.min(model.tau, 4 * h), td: 0 };
      case 'sopdt':
        return { kc: model.tau1 / (model.k * h), ti: Math.min(model.tau1, 4 * h), td: model.tau2 };
      case 'ipdt':
        return { kc: 1 / (model.k * h), ti: 4 * h, td: 0 };
      default:
        throw new ModelError('SIMC needs an fopdt, sopdt or ipdt model.', 'invalid_request', 'model.type');
    }
  },
};
