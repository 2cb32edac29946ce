import { describe, expect, it } from 'vitest';
import { roots } from '../../../src/lib/control/roots';
import { fromRoots, product } from '../../../src/lib/control/polynomial';
import fixtures from '../../reference/fixtures/roots.json';

describe('roots', () => {
  // Source: tests/reference/fixtures/roots.json (numpy.roots, companion-matrix eigenvalues).
  // Tolerance: 1e-7 relative to the root's magnitude (numpy itself is accurate to about that here).
  for (const c of fixtures.cases) {
    it(`matches numpy.roots for ${c.name}`, () => {
      const r = roots(c.poly);
      expect(r).toHaveLength(c.roots.length);
      r.forEach((z, i) => {
        const ref = c.roots[i];
        expect(Math.hypot(z.re - ref.re, z.im - ref.im)).toBeLessThan(1e-7 * Math.max(1, Math.hypot(ref.re, ref.im)));
      });
    });
  }

  it('returns exact zeros for trailing zero coefficients (1/s³ has three poles at 0)', () => {
    expect(roots([1, 0, 0, 0])).toEqual([{ re: 0, im: 0 }, { re: 0, im: 0 }, { re: 0, im: 0 }]);
  });

  it('recovers repeated poles exactly enough to be real: (s+1)^4 (s² + 2s + 5)² (closed form)', () => {
    const r = roots(product([[1, 1], [1, 1], [1, 1], [1, 1], [1, 2, 5], [1, 2, 5]]));
    const real = r.filter((z) => z.im === 0);
    expect(real).toHaveLength(4);
    real.forEach((z) => expect(z.re).toBeCloseTo(-1, 12));
    r.filter((z) => z.im !== 0).forEach((z) => {
      expect(z.re).toBeCloseTo(-1, 10);
      expect(Math.abs(z.im)).toBeCloseTo(2, 10);
    });
  });

  it('keeps close but distinct roots apart: (s+1)(s+1.001)(s+0.999)(s+5)', () => {
    const r = roots(product([[1, 1], [1, 1.001], [1, 0.999], [1, 5]]));
    expect(r.map((z) => z.re)).toEqual([expect.closeTo(-5, 12), expect.closeTo(-1.001, 9), expect.closeTo(-1, 9), expect.closeTo(-0.999, 9)]);
  });

  it('finds roots spread from 1e-4 to 1e3 (time constants 1 ms to 10 000 s)', () => {
    const r = roots(product([[0.001, 1], [10000, 1]]));
    expect(r[0].re / -1000).toBeCloseTo(1, 12);
    expect(r[1].re / -1e-4).toBeCloseTo(1, 12);
  });

  it('returns conjugate pairs exactly and sorts by real then imaginary part', () => {
    const r = roots(fromRoots([{ re: 0.5, im: 2 }, { re: 0.5, im: -2 }, { re: -3, im: 0 }, { re: -1, im: 1 }, { re: -1, im: -1 }]));
    expect(r.map((z) => [z.re, z.im]).map(([a, b]) => [Number(a.toFixed(10)), Number(b.toFixed(10))])).toEqual([[-3, 0], [-1, -1], [-1, 1], [0.5, -2], [0.5, 2]]);
    expect(r[1].re).toBe(r[2].re);
    expect(r[1].im).toBe(-r[2].im);
  });

  it('gives no roots for a constant and one for a line', () => {
    expect(roots([4])).toEqual([]);
    expect(roots([0, 0, 2, -4])).toEqual([{ re: 2, im: 0 }]);
  });
});
