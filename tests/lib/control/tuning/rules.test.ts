import { describe, expect, it } from 'vitest';
import { applicableRules, designController, rangeCheck, ruleById, tuningRules } from '../../../../src/lib/control/tuning/rules';
import { tune } from '../../../../src/lib/control/tuning';
import { modelErrorOf } from '../helpers';

describe('designController', () => {
  it('gives what tune gives for a valid request, without request validation (SIMC, Skogestad 2003)', () => {
    const model = { type: 'fopdt', k: 2, tau: 100, theta: 5 } as const;
    expect(designController(model, 'simc', 'pi')).toEqual(tune({ model, rule: 'simc', controller: 'pi' }));
  });

  it('still refuses a combination outside the contract table', () => {
    expect(modelErrorOf(() => designController({ type: 'ipdt', k: 1, theta: 1 }, 'imc', 'pi')).field).toBe('model.type');
  });
});

describe('tuningRules', () => {
  it('states a source, a range note and at least one case for every rule', () => {
    for (const rule of tuningRules) {
      expect(rule.source).toMatch(/\(\d{4}\)/);
      expect(rule.range.note.length).toBeGreaterThan(20);
      expect(rule.cases.length).toBeGreaterThan(0);
    }
  });

  it('lists the rules that cover an ipdt PI loop: SIMC and AMIGO', () => {
    expect(applicableRules('ipdt', 'pi').map((r) => r.id)).toEqual(['simc', 'amigo']);
  });
});

describe('rangeCheck', () => {
  it('flags θ/τ = 2 as outside the Ziegler–Nichols range and 0.2 as inside (common practice 0.1–1)', () => {
    const zn = ruleById('zn-open-loop');
    expect(rangeCheck(zn, { type: 'fopdt', k: 1, tau: 5, theta: 10 })).toEqual({ thetaOverTau: 2, inRange: false });
    expect(rangeCheck(zn, { type: 'fopdt', k: 1, tau: 10, theta: 2 }).inRange).toBe(true);
  });
});
