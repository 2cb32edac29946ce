import { describe, expect, it } from 'vitest';
import { tune } from '../../../../src/lib/control/tuning';
import { expectClose, modelErrorOf } from '../helpers';

const ZN = 'Ziegler & Nichols 1942, Trans. ASME 64:759–768';

describe('tune (zn-open-loop)', () => {
  // a = Kθ/τ = 1.5·3/9 = 0.5
  const model = { type: 'fopdt', k: 1.5, tau: 9, theta: 3 } as const;
  const rows = [
    { source: `${ZN}, reaction curve PI: kc = 0.9/a = 1.8, ti = 3.33L = 10θ/3 = 10 (contract)`, controller: 'pi', expected: { kc: 1.8, ti: 10, td: 0 } },
    { source: `${ZN}, reaction curve PID: kc = 1.2/a = 2.4, ti = 2L = 6, td = 0.5L = 1.5`, controller: 'pid', expected: { kc: 2.4, ti: 6, td: 1.5 } },
  ] as const;

  it.each(rows)('$source', ({ controller, expected }) => {
    const result = tune({ model, rule: 'zn-open-loop', controller });
    expect(result.controller.form).toBe('ideal');
    expectClose(result.controller.kc, expected.kc, 1e-12);
    expectClose(result.controller.ti, expected.ti, 1e-12);
    expectClose(result.controller.td, expected.td, 1e-12);
  });

  it('refuses a model without dead time, naming model.theta', () => {
    const error = modelErrorOf(() =>
      tune({ model: { type: 'fopdt', k: 1, tau: 9, theta: 0 }, rule: 'zn-open-loop', controller: 'pi' }),
    );
    expect(error.field).toBe('model.theta');
  });
});

describe('tune (zn-ultimate)', () => {
  const model = { type: 'ultimate', ku: 4, pu: 24 } as const;
  const rows = [
    { source: `${ZN}, ultimate sensitivity PI: kc = 0.45Ku = 1.8, ti = Pu/1.2 = 20`, controller: 'pi', expected: { kc: 1.8, ti: 20, td: 0 } },
    { source: `${ZN}, ultimate sensitivity PID: kc = 0.6Ku = 2.4, ti = Pu/2 = 12, td = Pu/8 = 3`, controller: 'pid', expected: { kc: 2.4, ti: 12, td: 3 } },
  ] as const;

  it.each(rows)('$source', ({ controller, expected }) => {
    const result = tune({ model, rule: 'zn-ultimate', controller });
    expect(result.controller.form).toBe('ideal');
    expectClose(result.controller.kc, expected.kc, 1e-12);
    expectClose(result.controller.ti, expected.ti, 1e-12);
    expectClose(result.controller.td, expected.td, 1e-12);
  });
});
