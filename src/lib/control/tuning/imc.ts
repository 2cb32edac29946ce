import type { TuningRule } from './rule';
import { asFopdt } from './guards';

/**
 * IMC-PID for an fopdt model with a first-order Padé view of the dead time (Rivera, Morari &
 * Skogestad 1986, Table 1), λ the IMC filter time constant (default τ):
 * - PI:  kc = (2τ+θ)/(2Kλ),       ti = τ + θ/2
 * - PID: kc = (2τ+θ)/(K(2λ+θ)),   ti = τ + θ/2,   td = τθ/(2τ+θ)
 */
export const imc: TuningRule = {
  id: 'imc',
  name: 'IMC-PID',
  source: 'Rivera, D. E., Morari, M. & Skogestad, S. (1986). Internal model control. 4. PID controller design. Ind. Eng. Chem. Process Des. Dev. 25, 252–265.',
  cases: [
    { model: 'fopdt', controller: 'pi', form: 'ideal' },
    { model: 'fopdt', controller: 'pid', form: 'ideal' },
  ],
  options: ['lambda'],
  range: {
    thetaOverTau: null,
    note: 'Any θ/τ; the paper recommends λ > 1.7θ for PI and λ > 0.8θ for PID (from memory of its Table 1).',
  },
  design(model, controller, options) {
    const { k, tau, theta } = asFopdt(model);
    const lam = options.lambda ?? tau;
    const ti = tau + theta / 2;
    if (controller === 'pi') return { kc: (2 * tau + theta) / (2 * k * lam), ti, td: 0 };
    return { kc: (2 * tau + theta) / (k * (2 * lam + theta)), ti, td: (tau * theta) / (2 * tau + theta) };
  },
};
