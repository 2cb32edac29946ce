import type { TuningRule } from './rule';
import { asFopdt } from './guards';

/**
 * Lambda tuning of a PI controller for an fopdt model (contract formula; the method goes back to
 * Dahlin 1968 and is set out for PI by Chien & Fruehauf 1990):
 *   kc = τ/(K(λ+θ)),  ti = τ,  λ the desired closed-loop time constant (default τ).
 */
export const lambda: TuningRule = {
  id: 'lambda',
  name: 'Lambda',
  source: 'Chien, I.-L. & Fruehauf, P. S. (1990). Consider IMC tuning to improve controller performance. Chem. Eng. Progress 86(10), 33–41.',
  cases: [{ model: 'fopdt', controller: 'pi', form: 'ideal' }],
  options: ['lambda'],
  range: {
    thetaOverTau: { min: null, max: 1 },
    note: 'Lag-dominant loops (θ/τ up to about 1, common practice); choose λ ≥ θ for robustness, λ = τ (the default) for a response as fast as open loop.',
  },
  design(model, _controller, options) {
    const m = asFopdt(model);
    const lam = options.lambda ?? m.tau;
    return { kc: m.tau / (m.k * (lam + m.theta)), ti: m.tau, td: 0 };
  },
};
