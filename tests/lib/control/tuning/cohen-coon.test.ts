import { describe, expect, it } from 'vitest';
import { tune } from '../../../../src/lib/control/tuning';
import { expectClose } from '../helpers';

const CC = 'Cohen & Coon 1953, as tabulated in Seborg, Edgar & Mellichamp, Process Dynamics and Control';

describe('tune (cohen-coon)', () => {
  // K = 1, τ = 10, θ = 5: r = 0.5, τ/(Kθ) = 2
  const model = { type: 'fopdt', k: 1, tau: 10, theta: 5 } as const;
  const rows = [
    {
      source: `${CC}: PI kc = 2(0.9 + 0.5/12) = 1.88333, ti = 5(30+1.5)/(9+10) = 8.28947 (hand-evaluated)`,
      controller: 'pi',
      expected: { kc: 2 * (0.9 + 0.5 / 12), ti: (5 * 31.5) / 19, td: 0 },
    },
    {
      source: `${CC}: PID kc = 2(4/3 + 0.5/4) = 2.91667, ti = 5(32+3)/(13+4) = 10.2941, td = 20/12 = 1.66667 (hand-evaluated)`,
      controller: 'pid',
      expected: { kc: 2 * (4 / 3 + 0.125), ti: (5 * 35) / 17, td: 20 / 12 },
    },
  ] as const;

  it.each(rows)('$source', ({ controller, expected }) => {
    const result = tune({ model, rule: 'cohen-coon', controller });
    expect(result.controller.form).toBe('ideal');
    expectClose(result.controller.kc, expected.kc, 1e-12);
    expectClose(result.controller.ti, expected.ti, 1e-12);
    expectClose(result.controller.td, expected.td, 1e-12);
  });

  it('is more aggressive than Ziegler–Nichols for small θ/τ (common practice: CC corrects ZN for dead time)', () => {
    const lag = { type: 'fopdt', k: 1, tau: 50, theta: 5 } as const;
    const cc = tune({ model: lag, rule: 'cohen-coon', controller: 'pi' }).controller;
    const zn = tune({ model: lag, rule: 'zn-open-loop', controller: 'pi' }).controller;
    expect(cc.kc).toBeGreaterThan(zn.kc);
  });
});
