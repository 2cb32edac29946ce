import { describe, expect, it } from 'vitest';
import katex from 'katex';
import type { ProcessModelInput } from '../../../src/lib/schemas';
import { modelLatex, polynomialLatex, transferFunctionLatex } from '../../../src/lib/recipes/model-latex';

describe('polynomialLatex', () => {
  it.each([
    { coefficients: [2.5, 1], latex: '2.5\\,s + 1' },
    { coefficients: [120, 43, 1], latex: '120\\,s^{2} + 43\\,s + 1' },
    { coefficients: [-0.048, 0.004], latex: '-0.048\\,s + 0.004' },
    { coefficients: [1, 0], latex: 's' },
    { coefficients: [5, 1, 0], latex: '5\\,s^{2} + s' },
    { coefficients: [0], latex: '0' },
  ])('writes $coefficients as $latex', ({ coefficients, latex }) => {
    expect(polynomialLatex(coefficients)).toBe(latex);
  });
});

describe('modelLatex', () => {
  it('writes each model type with its numbers, and KaTeX accepts every one', () => {
    const cases: { model: ProcessModelInput; latex: string }[] = [
      { model: { type: 'fopdt', k: 0.45, tau: 2.5, theta: 0.6 }, latex: '\\frac{0.45}{2.5\\,s + 1}\\,e^{-0.6\\,s}' },
      { model: { type: 'sopdt', k: 0.9, tau1: 20, tau2: 4, theta: 5 }, latex: '\\frac{0.9}{(20\\,s + 1)(4\\,s + 1)}\\,e^{-5\\,s}' },
      { model: { type: 'ipdt', k: 0.0125, theta: 0 }, latex: '\\frac{0.0125}{s}' },
      { model: { type: 'tf', num: [-0.3], den: [120, 43, 1], delay: 6 }, latex: '\\frac{-0.3}{120\\,s^{2} + 43\\,s + 1}\\,e^{-6\\,s}' },
    ];
    for (const { model, latex } of cases) {
      expect(modelLatex(model)).toBe(latex);
      expect(() => katex.renderToString(latex, { throwOnError: true })).not.toThrow();
    }
  });

  it('drops the fraction bar when the denominator is 1', () => {
    expect(transferFunctionLatex({ num: [2], den: [1] })).toBe('2');
  });
});
