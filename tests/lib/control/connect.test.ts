import { describe, expect, it } from 'vitest';
import { chain, feedback, parallel, series } from '../../../src/lib/control/connect';

describe('series', () => {
  it('multiplies and adds dead times', () => {
    expect(series({ num: [2], den: [3, 1], delay: 1 }, { num: [1, 1], den: [1, 2], delay: 0.5 })).toEqual({ num: [2, 2], den: [3, 7, 2], delay: 1.5 });
  });
});

describe('chain', () => {
  it('connects actuator → process → measurement in any order to the same product', () => {
    const a = { num: [1], den: [0.5, 1], delay: 0 }, p = { num: [2], den: [20, 1], delay: 3 }, m = { num: [1], den: [2, 1], delay: 0.2 };
    const x = chain([a, p, m]), y = chain([m, a, p]);
    expect(x.delay).toBeCloseTo(3.2, 14);
    expect(x.den).toEqual(y.den);
    expect(x.num).toEqual(y.num);
  });
});

describe('parallel', () => {
  it('adds paths with equal dead time and refuses different ones', () => {
    expect(parallel({ num: [1], den: [1, 1], delay: 0 }, { num: [1], den: [1, 2], delay: 0 })).toEqual({ num: [2, 3], den: [1, 3, 2], delay: 0 });
    expect(() => parallel({ num: [1], den: [1, 1], delay: 1 }, { num: [1], den: [1], delay: 0 })).toThrow(/different dead times/);
  });
});

describe('feedback', () => {
  it('gives G/(1 + GH): 1/(s+1) with H = 2 is 1/(s+3)', () => {
    expect(feedback({ num: [1], den: [1, 1], delay: 0 }, { num: [2], den: [1], delay: 0 })).toEqual({ num: [1], den: [1, 3], delay: 0 });
  });

  it('refuses dead time inside the loop (use the closed-loop simulation)', () => {
    expect(() => feedback({ num: [1], den: [1, 1], delay: 1 })).toThrow(/dead time/);
  });
});
