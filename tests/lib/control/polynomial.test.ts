import { describe, expect, it } from 'vitest';
import { add, degree, derivative, evaluate, evaluateComplex, fromRoots, multiply, trim } from '../../../src/lib/control/polynomial';

describe('polynomial helpers', () => {
  it('differentiates term by term: d/ds (s³ + 2s² + 3s + 4) = 3s² + 4s + 3, d²/ds² = 6s + 4 (power rule)', () => {
    expect(derivative([1, 2, 3, 4])).toEqual([3, 4, 3]);
    expect(derivative([1, 2, 3, 4], 2)).toEqual([6, 4]);
    expect(derivative([5])).toEqual([]);
  });

  it('trims, measures degree, multiplies and adds', () => {
    expect(trim([0, 0, 1, 2])).toEqual([1, 2]);
    expect(degree([0, 0])).toBe(-Infinity);
    expect(multiply([1, 1], [1, -1])).toEqual([1, 0, -1]);
    expect(add([1, 2, 3], [-1, 0])).toEqual([1, 1, 3]);
  });

  it('evaluates by Horner on reals and complex numbers: s² + 1 at s = j is 0', () => {
    expect(evaluate([2, -3, 1], 2)).toBe(3);
    expect(evaluateComplex([1, 0, 1], { re: 0, im: 1 })).toEqual({ re: 0, im: 0 });
  });

  it('builds a real polynomial from conjugate roots', () => {
    expect(fromRoots([{ re: -1, im: 2 }, { re: -1, im: -2 }])).toEqual([1, 2, 5]);
  });
});
