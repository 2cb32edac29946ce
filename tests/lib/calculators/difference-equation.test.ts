import { describe, expect, it } from 'vitest';
import { differenceEquationText, discreteStep, recurrence } from '../../../src/lib/calculators/difference-equation';

/**
 * Zero-order-hold equivalent of k/(τs + 1) at sample time h: G(z) = k(1 − p)/(z − p), p = e^(−h/τ).
 * Franklin, Powell & Workman, "Digital Control of Dynamic Systems" 3rd ed., §6.3 (section from
 * memory); the ZOH equivalent reproduces the continuous step response exactly at the samples.
 */
describe('discreteStep', () => {
  const cases = [
    { k: 2.5, tau: 30, h: 1, d: 0 },
    { k: 0.8, tau: 4, h: 0.5, d: 3 },
  ];
  for (const c of cases) {
    it(`matches k(1 − e^(−(t−θ)/τ)) at the samples for k=${c.k}, τ=${c.tau} s, h=${c.h} s, ${c.d} delay samples (ZOH exactness)`, () => {
      const p = Math.exp(-c.h / c.tau);
      const y = discreteStep({ num: [c.k * (1 - p)], den: [1, -p], delaySamples: c.d }, 60);
      y.forEach((v, n) => {
        const t = n * c.h - c.d * c.h;
        const expected = t <= 0 ? 0 : c.k * (1 - Math.exp(-t / c.tau));
        expect(v).toBeCloseTo(expected, 10);
      });
    });
  }
});

describe('recurrence', () => {
  it('lines a proper num up behind den and adds the delay as leading zeros of b', () => {
    expect(recurrence({ num: [0.2], den: [1, -0.8], delaySamples: 2 })).toEqual({ b: [0, 0, 0, 0.2], a: [1, -0.8] });
    expect(recurrence({ num: [0.5, 0.5], den: [1, -0.5], delaySamples: 0 })).toEqual({ b: [0.5, 0.5], a: [1, -0.5] });
  });
});

describe('differenceEquationText', () => {
  it('prints the recurrence with the delay in the input index', () => {
    expect(differenceEquationText({ num: [0.1903], den: [1, -0.9048], delaySamples: 2 })).toBe('y[k] = 0.9048·y[k−1] + 0.1903·u[k−3]');
  });
});
