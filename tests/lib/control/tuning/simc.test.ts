import { describe, expect, it } from 'vitest';
import { tune } from '../../../../src/lib/control/tuning';
import { expectClose, modelErrorOf } from '../helpers';

const S2003 = 'Skogestad 2003, J. Process Control 13:291–309';

describe('tune (simc)', () => {
  const rows = [
    {
      source: `${S2003}, half-rule example g0 = (−0.3s+1)(0.08s+1)/((2s+1)(s+1)(0.4s+1)(0.2s+1)(0.05s+1)³) → fopdt k=1, τ=2.5, θ=1.47; printed PI Kc=0.85, τI=2.5 (values from memory)`,
      model: { type: 'fopdt', k: 1, tau: 2.5, theta: 1.47 },
      controller: 'pi',
      expected: { form: 'ideal', kc: 0.85, ti: 2.5, td: 0 },
      rel: 0.005,
    },
    {
      source: `${S2003}, same example → sopdt k=1, τ1=2, τ2=1.2, θ=0.77; printed PID Kc=1.30, τI=2, τD=1.2 (series; from memory)`,
      model: { type: 'sopdt', k: 1, tau1: 2, tau2: 1.2, theta: 0.77 },
      controller: 'pid',
      expected: { form: 'series', kc: 1.3, ti: 2, td: 1.2 },
      rel: 0.005,
    },
    {
      source: `${S2003}, eq. for fopdt PI: kc = τ/(K(τc+θ)) = 100/(2·(5+5)) = 5, ti = min(100, 40) = 40 (hand-evaluated)`,
      model: { type: 'fopdt', k: 2, tau: 100, theta: 5 },
      controller: 'pi',
      expected: { form: 'ideal', kc: 5, ti: 40, td: 0 },
      rel: 1e-12,
    },
    {
      source: `${S2003}, integrating process: kc = 1/(K'(τc+θ)) = 1/(0.05·8) = 2.5, ti = 4·8 = 32 (hand-evaluated)`,
      model: { type: 'ipdt', k: 0.05, theta: 4 },
      controller: 'pi',
      expected: { form: 'ideal', kc: 2.5, ti: 32, td: 0 },
      rel: 1e-12,
    },
  ] as const;

  it.each(rows)('$source', ({ model, controller, expected, rel }) => {
    const { controller: c, rule, source } = tune({ model, rule: 'simc', controller });
    expect(rule).toBe('simc');
    expect(source).toMatch(/Skogestad/);
    expect(c.form).toBe(expected.form);
    expectClose(c.kc, expected.kc, rel);
    expectClose(c.ti, expected.ti, rel);
    expectClose(c.td, expected.td, rel);
  });

  it('uses options.tauC in place of θ: τc = 15 gives kc = 10/(1·(15+5)) = 0.5 and ti = min(10, 80) = 10', () => {
    const { controller } = tune({
      model: { type: 'fopdt', k: 1, tau: 10, theta: 5 },
      rule: 'simc',
      controller: 'pi',
      options: { tauC: 15 },
    });
    expectClose(controller.kc, 0.5, 1e-12);
    expectClose(controller.ti, 10, 1e-12);
  });

  it('answers a reverse-acting (negative) gain for a negative process gain', () => {
    const { controller } = tune({ model: { type: 'fopdt', k: -2, tau: 100, theta: 5 }, rule: 'simc', controller: 'pi' });
    expectClose(controller.kc, -5, 1e-12);
  });

  it('refuses the default τc = θ when θ is 0, naming options.tauC', () => {
    const error = modelErrorOf(() =>
      tune({ model: { type: 'fopdt', k: 1, tau: 10, theta: 0 }, rule: 'simc', controller: 'pi' }),
    );
    expect(error.code).toBe('invalid_request');
    expect(error.field).toBe('options.tauC');
  });
});
