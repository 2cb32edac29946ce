import { describe, expect, it } from 'vitest';
import katex from 'katex';
import { polynomialLatex, transferFunctionLatex, transferFunctionText } from '../../../src/lib/calculators/latex';

describe('polynomialLatex', () => {
  it('writes descending powers, skips zero terms and leaves out unit coefficients', () => {
    expect(polynomialLatex([30, 1])).toBe('30\\,s + 1');
    expect(polynomialLatex([1, 0, -2.5])).toBe('s^{2} - 2.5');
    expect(polynomialLatex([-1, 0])).toBe('-s');
    expect(polynomialLatex([0, 0])).toBe('0');
    expect(polynomialLatex([1.5e-7, 1])).toBe('1.500\\times10^{-7}\\,s + 1');
  });
});

describe('transferFunctionLatex', () => {
  it('writes a fraction with the dead time as an exponential, and KaTeX accepts it', () => {
    const tex = transferFunctionLatex({ num: [2.5], den: [150, 35, 1], delay: 4 });
    expect(tex).toBe('\\dfrac{2.5}{150\\,s^{2} + 35\\,s + 1}\\,e^{-4\\,s}');
    expect(() => katex.renderToString(tex, { throwOnError: true })).not.toThrow();
  });

  it('drops a unit denominator and a unit gain before a pure delay', () => {
    expect(transferFunctionLatex({ num: [0.8], den: [1] })).toBe('0.8');
    expect(transferFunctionLatex({ num: [1], den: [1], delay: 6 })).toBe('e^{-6\\,s}');
  });
});

describe('transferFunctionText', () => {
  it('writes the same transfer function as plain text', () => {
    expect(transferFunctionText({ num: [2.5], den: [150, 35, 1], delay: 4 })).toBe('(2.5) / (150 s^2 + 35 s + 1) · e^(−4 s)');
    expect(transferFunctionText({ num: [0.8], den: [1] })).toBe('0.8');
  });
});
