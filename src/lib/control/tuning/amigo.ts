import type { TuningRule } from './rule';
import { asFopdt, requireDeadTime } from './guards';

/**
 * AMIGO (Åström & Hägglund, Advanced PID Control, ISA 2006, ch. 7; PID rule from Hägglund &
 * Åström 2004). fopdt K, T = τ, L = θ; ipdt slope gain Kv:
 * - fopdt PI:  kc = 0.15/K + (0.35 − LT/(L+T)²)·T/(KL),  ti = 0.35L + 13LT²/(T² + 12LT + 7L²)
 * - fopdt PID: kc = (0.2 + 0.45·T/L)/K,  ti = (0.4L + 0.8T)/(L + 0.1T)·L,  td = 0.5LT/(0.3L + T)
 * - ipdt PI:   kc = 0.35/(Kv·L),  ti = 13.4L
 * - ipdt PID:  kc = 0.45/(Kv·L),  ti = 8L,  td = 0.5L
 * Written from memory of the book; the predicted Ms near its design value 1.4 is checked in tests.
 */
export const amigo: TuningRule = {
  id: 'amigo',
  name: 'AMIGO',
  source: 'Åström, K. J. & Hägglund, T. (2006). Advanced PID Control, ISA, ch. 7 (PID rule: Hägglund & Åström (2004), J. Process Control 14, 635–650).',
  cases: [
    { model: 'fopdt', controller: 'pi', form: 'ideal' },
    { model: 'fopdt', controller: 'pid', form: 'ideal' },
    { model: 'ipdt', controller: 'pi', form: 'ideal' },
    { model: 'ipdt', controller: 'pid', form: 'ideal' },
  ],
  options: [],
  range: {
    thetaOverTau: null,
    note: 'Fitted for Ms about 1.4 over a test batch spanning all normalized dead times θ/(θ+τ); the PID rule is conservative for lag-dominant loops (from memory of the book).',
  },
  design(model, controller) {
    if (model.type === 'ipdt') {
      const L = requireDeadTime(model.theta, 'AMIGO');
      const kv = model.k;
      if (controller === 'pi') return { kc: 0.35 / (kv * L), ti: 13.4 * L, td: 0 };
      return { kc: 0.45 / (kv * L), ti: 8 * L, td: 0.5 * L };
    }
    const { k: K, tau: T, theta } = asFopdt(model);
    const L = requireDeadTime(theta, 'AMIGO');
    if (controller === 'pi') {
      return {
        kc: 0.15 / K + (0.35 - (L * T) / (L + T) ** 2) * (T / (K * L)),
        ti: 0.35 * L + (13 * L * T * T) / (T * T + 12 * L * T + 7 * L * L),
        td: 0,
      };
    }
    return {
      kc: (0.2 + (0.45 * T) / L) / K,
      ti: ((0.4 * L + 0.8 * T) / (L + 0.1 * T)) * L,
      td: (0.5 * L * T) / (0.3 * L + T),
    };
  },
};
