import { describe, expect, it } from 'vitest';
import { createTransferFunction, dcGain, relativeDegree } from '../../../src/lib/control/transfer-function';
import { fromProcessModel } from '../../../src/lib/control/process-model';

describe('createTransferFunction', () => {
  const bad: [string, unknown, string][] = [
    ['empty den', { num: [1], den: [] }, 'g.den'],
    ['all-zero den', { num: [1], den: [0, 0] }, 'g.den'],
    ['non-finite num', { num: [1, Infinity], den: [1, 1] }, 'g.num.1'],
    ['improper', { num: [1, 2, 3], den: [1, 1] }, 'g.num'],
    ['order above 20', { num: [1], den: new Array(22).fill(1) }, 'g.den'],
    ['negative delay', { num: [1], den: [1, 1], delay: -0.1 }, 'g.delay'],
    ['NaN delay', { num: [1], den: [1, 1], delay: NaN }, 'g.delay'],
    ['num not a list', { num: 3, den: [1, 1] }, 'g.num'],
  ];
  for (const [name, input, field] of bad) {
    it(`refuses ${name} with invalid_model at ${field}`, () => {
      expect(() => createTransferFunction(input as never, { field: 'g' })).toThrow(expect.objectContaining({ code: 'invalid_model', field }));
    });
  }

  it('trims leading zeros and defaults the delay to 0', () => {
    expect(createTransferFunction({ num: [0, 2], den: [0, 3, 1] })).toEqual({ num: [2], den: [3, 1], delay: 0 });
  });

  it('accepts an improper controller when asked to', () => {
    expect(createTransferFunction({ num: [1, 0], den: [1] }, { allowImproper: true }).num).toEqual([1, 0]);
  });
});

describe('dcGain', () => {
  it('is num(0)/den(0), null with an integrator, and cancels shared roots at 0', () => {
    expect(dcGain({ num: [2], den: [5, 4], delay: 1 })).toBe(0.5);
    expect(dcGain({ num: [2], den: [1, 0], delay: 0 })).toBeNull();
    expect(dcGain({ num: [3, 0], den: [1, 2, 0], delay: 0 })).toBe(1.5);
    expect(relativeDegree({ num: [1, 1], den: [1, 2, 3], delay: 0 })).toBe(1);
  });
});

describe('fromProcessModel', () => {
  it('builds FOPDT, SOPDT and IPDT transfer functions', () => {
    expect(fromProcessModel({ type: 'fopdt', k: 2, tau: 30, theta: 4 })).toEqual({ num: [2], den: [30, 1], delay: 4 });
    expect(fromProcessModel({ type: 'sopdt', k: 1.5, tau1: 20, tau2: 5, theta: 2 })).toEqual({ num: [1.5], den: [100, 25, 1], delay: 2 });
    expect(fromProcessModel({ type: 'ipdt', k: 0.02, theta: 6 })).toEqual({ num: [0.02], den: [1, 0], delay: 6 });
    expect(() => fromProcessModel({ type: 'fopdt', k: 2, tau: -1, theta: 0 })).toThrow(expect.objectContaining({ field: 'tau' }));
  });
});
