import { describe, expect, it } from 'vitest';
import { tune } from '../../../../src/lib/control/tuning';
import { expectClose } from '../helpers';

const AH = 'Åström & Hägglund 2006, Advanced PID Control, ch. 7 (AMIGO)';

describe('tune (amigo)', () => {
  const rows = [
    {
      source: `${AH} fopdt PI, K=1 T=10 L=5: kc = 0.15 + (0.35 − 50/225)·2 = 0.405556, ti = 1.75 + 6500/875 = 9.178571 (hand-evaluated)`,
      model: { type: 'fopdt', k: 1, tau: 10, theta: 5 },
      controller: 'pi',
      expected: { kc: 0.15 + (0.35 - 50 / 225) * 2, ti: 1.75 + 6500 / 875, td: 0 },
    },
    {
      source: `${AH} fopdt PID, K=1 T=10 L=5: kc = 0.2 + 0.45·2 = 1.1, ti = (2+8)/(5+1)·5 = 8.3333, td = 25/11.5 = 2.1739 (hand-evaluated)`,
      model: { type: 'fopdt', k: 1, tau: 10, theta: 5 },
      controller: 'pid',
      expected: { kc: 1.1, ti: 50 / 6, td: 25 / 11.5 },
    },
    {
      source: `${AH} integrating PI, Kv=0.1 L=2: kc = 0.35/(0.1·2) = 1.75, ti = 13.4·2 = 26.8`,
      model: { type: 'ipdt', k: 0.1, theta: 2 },
      controller: 'pi',
      expected: { kc: 1.75, ti: 26.8, td: 0 },
    },
    {
      source: `${AH} integrating PID, Kv=0.1 L=2: kc = 0.45/0.2 = 2.25, ti = 8·2 = 16, td = 0.5·2 = 1`,
      model: { type: 'ipdt', k: 0.1, theta: 2 },
      controller: 'pid',
      expected: { kc: 2.25, ti: 16, td: 1 },
    },
  ] as const;

  it.each(rows)('$source', ({ model, controller, expected }) => {
    const result = tune({ model, rule: 'amigo', controller });
    expect(result.controller.form).toBe('ideal');
    expectClose(result.controller.kc, expected.kc, 1e-12);
    expectClose(result.controller.ti, expected.ti, 1e-12);
    expectClose(result.controller.td, expected.td, 1e-12);
  });
});
