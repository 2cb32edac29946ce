import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseTransferFunction } from '../../../src/lib/control/parse';
import { modelErrorOf } from './helpers';

/** num/den equal up to one common factor (a transfer function's coefficients are not unique). */
function expectSameRatio(actual: { num: number[]; den: number[] }, expected: { num: number[]; den: number[] }): void {
  expect(actual.num.length).toBe(expected.num.length);
  expect(actual.den.length).toBe(expected.den.length);
  const f = actual.den[0] / expected.den[0];
  actual.num.forEach((c, i) => expect(c).toBeCloseTo(expected.num[i] * f, 12));
  actual.den.forEach((c, i) => expect(c).toBeCloseTo(expected.den[i] * f, 12));
}

describe('parseTransferFunction', () => {
  // Expected values expanded by hand: (30s+1)(5s+1) = 150s² + 35s + 1, etc.
  const rows = [
    { text: '2.5*exp(-4s)/((30s+1)(5s+1))', num: [2.5], den: [150, 35, 1], delay: 4 },
    { text: '0.8*exp(-2*s)/(12*s+1)', num: [0.8], den: [12, 1], delay: 2 },
    { text: '0.8 exp(-2 s) / (12 s + 1)', num: [0.8], den: [12, 1], delay: 2 },
    { text: '1/(s+1)^3', num: [1], den: [1, 3, 3, 1], delay: 0 },
    { text: '(-2s+1)/((5s+1)(s+1))', num: [-2, 1], den: [5, 6, 1], delay: 0 },
    { text: '0.05*exp(-8s)/s', num: [0.05], den: [1, 0], delay: 8 },
    { text: '3e^(-1.5s)/(4s+1)', num: [3], den: [4, 1], delay: 1.5 },
    { text: 'exp(-2s)*exp(-3s)/(s+1)', num: [1], den: [1, 1], delay: 5 },
    { text: '(s+2)/(s^2+0.4s+1)', num: [1, 2], den: [1, 0.4, 1], delay: 0 },
    { text: '1/(s/10+1)', num: [10], den: [1, 10], delay: 0 },
    { text: '4', num: [4], den: [1], delay: 0 },
    { text: '2*exp(-0.5)/(s+1)', num: [2 * Math.exp(-0.5)], den: [1, 1], delay: 0 },
    { text: '1/(1-10s)', num: [-1], den: [10, -1], delay: 0 },
    { text: '(s+1)^-1', num: [1], den: [1, 1], delay: 0 },
    { text: '2.5e-3/(s+1)', num: [0.0025], den: [1, 1], delay: 0 },
  ];

  it.each(rows)('reads $text', ({ text, num, den, delay }) => {
    const g = parseTransferFunction(text);
    expectSameRatio(g, { num, den });
    expect(g.delay).toBeCloseTo(delay, 12);
  });

  it('accepts an improper expression only when asked', () => {
    expect(modelErrorOf(() => parseTransferFunction('2(1+3s)')).code).toBe('invalid_request');
    expect(parseTransferFunction('2(1+3s)', { allowImproper: true })).toEqual({ num: [6, 2], den: [1], delay: 0 });
  });

  const bad = [
    { text: '', reason: /Type a transfer function/ },
    { text: '2*(s+', reason: /does not parse/ },
    { text: 'x/(s+1)', reason: /Unknown name "x"/ },
    { text: 'sin(s)/(s+1)', reason: /Only exp/ },
    { text: 'exp(4s)/(s+1)', reason: /prediction/ },
    { text: 'exp(-s^2)', reason: /exp\(-θ·s\)/ },
    { text: '1/(s+1)^0.5', reason: /whole numbers/ },
    { text: '1/(s+1)^s', reason: /exponent must be a number/ },
    { text: '1/(s-s)', reason: /divides by zero/ },
    { text: 'exp(-2s)/(s+1) + 1/(s+2)', reason: /different dead times/ },
    { text: '1/2s', reason: /ambiguous/ },
    { text: 's*exp(2s)', reason: /prediction/ },
    { text: '0*s', reason: /identically zero/ },
    { text: '1/((s+1)^15 (s+2)^6)', reason: /above 20/ },
    { text: '1/(s+1)^21', reason: /whole numbers up to 20/ },
    { text: 'a = 2', reason: /not part of a transfer function/ },
    { text: '1/(s+1)'.repeat(80), reason: /longer than/ },
  ];

  it.each(bad)('refuses "$text" with a reason ($reason)', ({ text, reason }) => {
    const error = modelErrorOf(() => parseTransferFunction(text, { field: 'plant.expression' }));
    expect(error.code).toBe('invalid_request');
    expect(error.field).toBe('plant.expression');
    expect(error.message).toMatch(reason);
  });
});

describe('parseTransferFunction (properties)', () => {
  it('reads back K·exp(−θs)/Π(τᵢs+1) typed with implicit multiplication (expansion of the product by hand rule)', () => {
    const number = fc.double({ min: 0.01, max: 500, noNaN: true }).map((x) => Number(x.toPrecision(4)));
    fc.assert(
      fc.property(number, fc.double({ min: 0, max: 100, noNaN: true }).map((x) => Number(x.toFixed(2))), fc.array(number, { minLength: 1, maxLength: 4 }), (k, theta, taus) => {
        const text = `${k}*exp(-${theta}s)/(${taus.map((tau) => `(${tau}s+1)`).join('')})`;
        const g = parseTransferFunction(text);
        const den = taus.reduce<number[]>((p, tau) => p.map((c, i) => c * tau + (p[i - 1] ?? 0)).concat(p[p.length - 1]), [1]);
        expect(g.delay).toBeCloseTo(theta, 12);
        expect(g.num).toHaveLength(1);
        expect(g.den).toHaveLength(den.length);
        const f = g.den[0] / den[0];
        expect(g.num[0] / f).toBeCloseTo(k, 9);
        g.den.forEach((c, i) => expect(Math.abs(c / f - den[i])).toBeLessThanOrEqual(1e-12 * Math.max(...den.map(Math.abs))));
      }),
      { numRuns: 150 },
    );
  });
});
