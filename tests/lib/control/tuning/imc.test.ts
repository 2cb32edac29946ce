import { describe, expect, it } from 'vitest';
import { tune } from '../../../../src/lib/control/tuning';
import { expectClose } from '../helpers';

const R1986 = 'Rivera, Morari & Skogestad 1986, Table 1 (fopdt, first-order Padé)';

describe('tune (imc)', () => {
  const rows = [
    {
      source: `${R1986} PI: kc = (2τ+θ)/(2Kλ) = 22/(2·2·10) = 0.55, ti = τ+θ/2 = 11 (hand-evaluated, default λ = τ)`,
      controller: 'pi',
      options: {},
      expected: { kc: 0.55, ti: 11, td: 0 },
    },
    {
      source: `${R1986} PID: kc = (2τ+θ)/(K(2λ+θ)) = 22/(2·22) = 0.5, ti = 11, td = τθ/(2τ+θ) = 20/22 (hand-evaluated)`,
      controller: 'pid',
      options: {},
      expected: { kc: 0.5, ti: 11, td: 20 / 22 },
    },
    {
      source: `${R1986} PID with λ = 0.8θ = 1.6: kc = 22/(2·(3.2+2)) = 2.1154 (hand-evaluated)`,
      controller: 'pid',
      options: { lambda: 1.6 },
      expected: { kc: 22 / 10.4, ti: 11, td: 20 / 22 },
    },
  ] as const;

  it.each(rows)('$source', ({ controller, options, expected }) => {
    const model = { type: 'fopdt', k: 2, tau: 10, theta: 2 } as const;
    const result = tune({ model, rule: 'imc', controller, options });
    expect(result.controller.form).toBe('ideal');
    expectClose(result.controller.kc, expected.kc, 1e-12);
    expectClose(result.controller.ti, expected.ti, 1e-12);
    expectClose(result.controller.td, expected.td, 1e-12);
  });
});
