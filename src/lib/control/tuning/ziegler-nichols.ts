import type { TuningRule } from './rule';
import { asFopdt, asUltimate, requireDeadTime } from './guards';

const source =
  'Ziegler, J. G. & Nichols, N. B. (1942). Optimum settings for automatic controllers. Trans. ASME 64, 759–768.';

/**
 * Reaction-curve rule, with the slope R = K/τ and lag L = θ of the step response, a = R·L = Kθ/τ:
 * - PI:  kc = 0.9/a,  ti = 10θ/3 (the paper's 3.33 L)
 * - PID: kc = 1.2/a,  ti = 2θ,  td = θ/2
 * (the paper's table, written from memory; the PI ti is the contract's 10θ/3)
 */
export const zieglerNicholsOpenLoop: TuningRule = {
  id: 'zn-open-loop',
  name: 'Ziegler–Nichols reaction curve',
  source,
  cases: [
    { model: 'fopdt', controller: 'pi', form: 'ideal' },
    { model: 'fopdt', controller: 'pid', form: 'ideal' },
  ],
  options: [],
  range: {
    thetaOverTau: { min: 0.1, max: 1 },
    note: 'Aims at quarter-amplitude decay, so expect oscillatory loops (Ms often above 2); usual range 0.1 ≤ θ/τ ≤ 1 (common practice).',
  },
  design(model, controller) {
    const m = asFopdt(model);
    const theta = requireDeadTime(m.theta, 'Ziegler–Nichols');
    const a = (m.k * theta) / m.tau;
    if (controller === 'pi') return { kc: 0.9 / a, ti: (10 * theta) / 3, td: 0 };
    return { kc: 1.2 / a, ti: 2 * theta, td: theta / 2 };
  },
};

/**
 * Ultimate-gain rule from the gain Ku and period Pu of sustained oscillation:
 * - PI:  kc = 0.45 Ku,  ti = Pu/1.2
 * - PID: kc = 0.6 Ku,   ti = Pu/2,  td = Pu/8
 */
export const zieglerNicholsUltimate: TuningRule = {
  id: 'zn-ultimate',
  name: 'Ziegler–Nichols ultimate gain',
  source,
  cases: [
    { model: 'ultimate', controller: 'pi', form: 'ideal' },
    { model: 'ultimate', controller: 'pid', form: 'ideal' },
  ],
  options: [],
  range: {
    thetaOverTau: null,
    note: 'Needs the ultimate point of the running loop (relay or gain test); aims at quarter-amplitude decay, so expect oscillatory loops.',
  },
  design(model, controller) {
    const { ku, pu } = asUltimate(model);
    if (controller === 'pi') return { kc: 0.45 * ku, ti: pu / 1.2, td: 0 };
    return { kc: 0.6 * ku, ti: pu / 2, td: pu / 8 };
  },
};
