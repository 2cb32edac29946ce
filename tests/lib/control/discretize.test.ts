import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { discretize } from '../../../src/lib/control/discretize';
import fixtures from '../../reference/fixtures/discrete.json';
import { modelErrorOf } from './helpers';

/** Coefficients equal within tol relative to the largest coefficient, after dropping leading zeros. */
function expectPolynomial(actual: number[], expected: number[], tol: number): void {
  const peak = Math.max(...expected.map(Math.abs));
  const drop = (p: number[]) => {
    let i = 0;
    while (i < p.length - 1 && Math.abs(p[i]) <= 1e-14 * peak) i++;
    return p.slice(i);
  };
  const a = drop(actual);
  const e = drop(expected);
  expect(a.length, `${a} vs ${e}`).toBe(e.length);
  a.forEach((v, i) => expect(Math.abs(v - e[i]), `coefficient ${i}: ${a} vs ${e}`).toBeLessThanOrEqual(tol * peak));
}

const source = fixtures.source;

describe('discretize', () => {
  describe.each(['zoh', 'tustin'] as const)('method %s', (method) => {
    it.each(fixtures.plants)(`matches ${source} for $name`, (row) => {
      const result = discretize({ tf: row.tf, ts: row.ts, method });
      expect(result.den[0]).toBe(1);
      expect(result.delaySamples).toBe(0);
      expectPolynomial(result.den, row[method].den, 1e-9);
      expectPolynomial(result.num, row[method].num, 1e-9);
    });
  });

  it.each(fixtures.prewarped)(`matches ${source} (bilinear at 2·tan(w·ts/2)/w) for Tustin pre-warped: $name`, (row) => {
    const result = discretize({ tf: row.tf, ts: row.ts, method: 'tustin', prewarp: row.prewarp });
    expectPolynomial(result.den, row.tustin.den, 1e-10);
    expectPolynomial(result.num, row.tustin.num, 1e-10);
  });

  it('keeps the frequency response exact at the pre-warp frequency (definition of pre-warping)', () => {
    const w = 2;
    const ts = 0.5;
    const g = discretize({ tf: { num: [1], den: [1, 0.2, 4] }, ts, method: 'tustin', prewarp: w });
    const evalAt = (p: number[], re: number, im: number) =>
      p.reduce((acc, c) => ({ re: acc.re * re - acc.im * im + c, im: acc.re * im + acc.im * re }), { re: 0, im: 0 });
    const zr = Math.cos(w * ts);
    const zi = Math.sin(w * ts);
    const n = evalAt(g.num, zr, zi);
    const d = evalAt(g.den, zr, zi);
    const magDiscrete = Math.hypot(n.re, n.im) / Math.hypot(d.re, d.im);
    const magContinuous = 1 / Math.hypot(4 - w * w, 0.2 * w); // |1/((jw)² + 0.2jw + 4)| = 2.5 at w = 2
    expect(Math.abs(magDiscrete - magContinuous)).toBeLessThan(1e-9 * magContinuous);
  });

  it('maps the ZOH poles to e^(p·ts): 1/((s+1)(s+3)) at ts = 0.1 (definition of the hold equivalent)', () => {
    const { den } = discretize({ tf: { num: [1], den: [1, 4, 3] }, ts: 0.1, method: 'zoh' });
    const p1 = Math.exp(-0.1);
    const p2 = Math.exp(-0.3);
    expect(den[1]).toBeCloseTo(-(p1 + p2), 13);
    expect(den[2]).toBeCloseTo(p1 * p2, 13);
  });

  it('keeps the static gain under ZOH: G(z=1) = G(s=0) = 2.5 for 2.5/((30s+1)(5s+1))', () => {
    const { num, den } = discretize({ tf: { num: [2.5], den: [150, 35, 1] }, ts: 2, method: 'zoh' });
    const sum = (p: number[]) => p.reduce((a, b) => a + b, 0);
    expect(sum(num) / sum(den)).toBeCloseTo(2.5, 10);
  });

  const delays = [
    { delay: 4, ts: 0.5, samples: 8, why: 'an exact multiple' },
    { delay: 0.3, ts: 0.1, samples: 3, why: '0.3/0.1 = 2.9999999999999996 in floating point' },
    { delay: 0, ts: 0.25, samples: 0, why: 'no dead time' },
  ];
  it.each(delays)('turns a dead time of $delay s at ts $ts into $samples samples ($why)', ({ delay, ts, samples }) => {
    expect(discretize({ tf: { num: [1], den: [10, 1], delay }, ts, method: 'zoh' }).delaySamples).toBe(samples);
  });

  const bad = [
    { why: 'a dead time that is not whole samples', request: { tf: { num: [1], den: [10, 1], delay: 0.35 }, ts: 0.1, method: 'zoh' }, code: 'invalid_request', field: 'tf.delay' },
    { why: 'an improper transfer function', request: { tf: { num: [1, 0, 0], den: [1, 1] }, ts: 0.1, method: 'zoh' }, code: 'invalid_model', field: 'tf.num' },
    { why: 'an order above 20', request: { tf: { num: [1], den: new Array(22).fill(1) }, ts: 0.1, method: 'zoh' }, code: 'invalid_model', field: 'tf.den' },
    { why: 'an all-zero denominator', request: { tf: { num: [1], den: [0, 0] }, ts: 0.1, method: 'tustin' }, code: 'invalid_model', field: 'tf.den' },
    { why: 'a zero sample time', request: { tf: { num: [1], den: [1, 1] }, ts: 0, method: 'zoh' }, code: 'invalid_request', field: 'ts' },
    { why: 'an unknown method', request: { tf: { num: [1], den: [1, 1] }, ts: 1, method: 'foh' }, code: 'invalid_request', field: 'method' },
    { why: 'a NaN coefficient', request: { tf: { num: [Number.NaN], den: [1, 1] }, ts: 1, method: 'zoh' }, code: 'invalid_model', field: 'tf.num.0' },
    { why: 'an unstable pole over a very long sample', request: { tf: { num: [1], den: [1, -1] }, ts: 1e4, method: 'zoh' }, code: 'invalid_request', field: 'ts' },
    { why: 'a pre-warp above Nyquist', request: { tf: { num: [1], den: [1, 1] }, ts: 1, method: 'tustin', prewarp: 4 }, code: 'invalid_request', field: 'prewarp' },
    { why: 'a pre-warp with ZOH', request: { tf: { num: [1], den: [1, 1] }, ts: 1, method: 'zoh', prewarp: 1 }, code: 'invalid_request', field: 'prewarp' },
    { why: 'a negative dead time', request: { tf: { num: [1], den: [1, 1], delay: -1 }, ts: 1, method: 'zoh' }, code: 'invalid_model', field: 'tf.delay' },
  ];
  // api-v1.md: non-finite numbers, improper, all-zero den and negative delay are invalid_model.
  it.each(bad)('refuses $why, naming the field', ({ request, code, field }) => {
    const error = modelErrorOf(() => discretize(request));
    expect(error.code).toBe(code);
    expect(error.field).toBe(field);
  });
});

describe('discretize (properties)', () => {
  // Random stable lags (τ from 0.05 s to 200 s), gains and sample times.
  const lags = fc.array(fc.double({ min: 0.05, max: 200, noNaN: true }), { minLength: 1, maxLength: 5 });
  const gain = fc.double({ min: -50, max: 50, noNaN: true }).filter((k) => Math.abs(k) > 1e-3);
  const ts = fc.double({ min: 0.01, max: 5, noNaN: true });
  const build = (k: number, taus: number[]) => ({
    num: [k],
    den: taus.reduce<number[]>((p, tau) => p.map((c, i) => c * tau + (p[i - 1] ?? 0)).concat(p[p.length - 1]), [1]),
  });
  const sum = (p: number[]) => p.reduce((a, b) => a + b, 0);

  // With poles near z = 1 (ts ≪ τ) the monomial coefficients carry G(1) as a small difference:
  // the attainable accuracy is about eps·Σ|den|/|Σden| (the condition number of that sum).
  it('keeps the static gain G(z=1) = G(s=0) for ZOH and Tustin within the conditioning of den(1) (both map s = 0 to z = 1; definition)', () => {
    fc.assert(
      fc.property(gain, lags, ts, fc.constantFrom('zoh' as const, 'tustin' as const), (k, taus, h, method) => {
        const tf = build(k, taus);
        const g = discretize({ tf, ts: h, method });
        const condition = sum(g.den.map(Math.abs)) / Math.abs(sum(g.den));
        // Σden rounding to exactly 0 (five lags near 200 s at ts = 0.01 s) leaves no digits of G(1) to check.
        fc.pre(Number.isFinite(condition));
        expect(Math.abs(sum(g.num) / sum(g.den) / k - 1)).toBeLessThan(1e-12 * condition);
      }),
      { numRuns: 150 },
    );
  });

  it('puts the ZOH poles at e^(−ts/τ) for a chain of lags (definition of the hold equivalent)', () => {
    fc.assert(
      fc.property(gain, lags, ts, (k, taus, h) => {
        const g = discretize({ tf: build(k, taus), ts: h, method: 'zoh' });
        const expected = taus.reduce<number[]>((p, tau) => p.map((c, i) => c - Math.exp(-h / tau) * (p[i - 1] ?? 0)).concat(-Math.exp(-h / tau) * p[p.length - 1]), [1]);
        g.den.forEach((c, i) => expect(c).toBeCloseTo(expected[i], 8));
      }),
      { numRuns: 150 },
    );
  });
});
