import { describe, expect, it } from 'vitest';
import { tune } from '../../../../src/lib/control/tuning';
import { expectClose } from '../helpers';

describe('tune (lambda)', () => {
  const rows = [
    {
      source: 'api-v1 contract formula kc = τ/(K(λ+θ)), ti = τ; default λ = τ: 20/(0.5·(20+4)) = 1.6667 (hand-evaluated)',
      model: { type: 'fopdt', k: 0.5, tau: 20, theta: 4 },
      options: {},
      expected: { kc: 20 / 12, ti: 20 },
    },
    {
      source: 'api-v1 contract formula with λ = 3θ = 12: 20/(0.5·16) = 2.5 (hand-evaluated)',
      model: { type: 'fopdt', k: 0.5, tau: 20, theta: 4 },
      options: { lambda: 12 },
      expected: { kc: 2.5, ti: 20 },
    },
  ] as const;

  it.each(rows)('$source', ({ model, options, expected }) => {
    const { controller } = tune({ model, rule: 'lambda', controller: 'pi', options });
    expect(controller.form).toBe('ideal');
    expectClose(controller.kc, expected.kc, 1e-12);
    expectClose(controller.ti, expected.ti, 1e-12);
    expect(controller.td).toBe(0);
  });

  it('agrees with SIMC PI when λ = τc and τ ≤ 4(τc+θ) (both are IMC designs; Skogestad 2003 §4)', () => {
    const model = { type: 'fopdt', k: 1.7, tau: 12, theta: 3 } as const;
    const a = tune({ model, rule: 'lambda', controller: 'pi', options: { lambda: 6 } }).controller;
    const b = tune({ model, rule: 'simc', controller: 'pi', options: { tauC: 6 } }).controller;
    expectClose(a.kc, b.kc, 1e-12);
    expectClose(a.ti, b.ti, 1e-12);
  });
});
