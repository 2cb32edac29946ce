import type { TuningRule } from './rule';
import { asFopdt, requireDeadTime } from './guards';

/**
 * Cohen–Coon (1953) for an fopdt model, r = θ/τ, in the form textbooks tabulate (e.g. Seborg,
 * Edgar & Mellichamp, Process Dynamics and Control, table of Cohen–Coon settings):
 * - PI:  kc = (τ/(Kθ))(0.9 + r/12),   ti = θ(30 + 3r)/(9 + 20r)
 * - PID: kc = (τ/(Kθ))(4/3 + r/4),    ti = θ(32 + 6r)/(13 + 8r),   td = 4θ/(11 + 2r)
 * Written from memory of that table (the 1953 paper states them as charts and formulas in R, L).
 */
export const cohenCoon: TuningRule = {
  id: 'cohen-coon',
  name: 'Cohen–Coon',
  source: 'Cohen, G. H. & Coon, G. A. (1953). Theoretical consideration of retarded control. Trans. ASME 75, 827–834.',
  cases: [
    { model: 'fopdt', controller: 'pi', form: 'ideal' },
    { model: 'fopdt', controller: 'pid', form: 'ideal' },
  ],
  options: [],
  range: {
    thetaOverTau: { min: 0.1, max: 1 },
    note: 'Aims at quarter-amplitude decay like Ziegler–Nichols, so loops are aggressive; usual range 0.1 ≤ θ/τ ≤ 1 (common practice).',
  },
  design(model, controller) {
    const m = asFopdt(model);
    const theta = requireDeadTime(m.theta, 'Cohen–Coon');
    const r = theta / m.tau;
    const base = m.tau / (m.k * theta);
    if (controller === 'pi') {
      return { kc: base * (0.9 + r / 12), ti: (theta * (30 + 3 * r)) / (9 + 20 * r), td: 0 };
    }
    return {
      kc: base * (4 / 3 + r / 4),
      ti: (theta * (32 + 6 * r)) / (13 + 8 * r),
      td: (4 * theta) / (11 + 2 * r),
    };
  },
};
