import { describe, expect, it } from 'vitest';
import {
  fopdtStep,
  fopdtStepGradient,
  ipdtStep,
  sopdtStep,
  sopdtStepGradient,
} from '../../../src/lib/control/identify-models';

describe('fopdtStep', () => {
  it.each([
    { x: 7, tau: 5, theta: 2, expected: 1 - Math.exp(-1), source: 'one time constant after the dead time: 63.2 % (handbook fact)' },
    { x: 2 + 3 * 5, tau: 5, theta: 2, expected: 1 - Math.exp(-3), source: 'three time constants: 95.0 % (handbook fact)' },
    { x: 1.5, tau: 5, theta: 2, expected: 0, source: 'zero inside the dead time' },
  ])('$source', ({ x, tau, theta, expected }) => {
    expect(fopdtStep(x, tau, theta)).toBeCloseTo(expected, 14);
  });
});

describe('sopdtStep', () => {
  it('meets the repeated-pole closed form 1 − (1 + t/τ)e^(−t/τ) as τ2 → τ1 (Seborg et al., critically damped second order)', () => {
    const exact = 1 - (1 + 6 / 4) * Math.exp(-6 / 4);
    expect(sopdtStep(7, 4, 4, 1)).toBeCloseTo(exact, 14);
    expect(sopdtStep(7, 4 * (1 + 1e-4), 4, 1)).toBeCloseTo(exact, 4);
  });
});

describe('ipdtStep', () => {
  it('is the ramp after the dead time', () => {
    expect(ipdtStep(10, 4)).toBe(6);
    expect(ipdtStep(3, 4)).toBe(0);
  });
});

describe('step gradients', () => {
  const h = 1e-6;
  it.each([
    { x: 9, tau: 5, theta: 2 },
    { x: 40, tau: 12, theta: 7 },
  ])('fopdt gradient matches central differences at x=$x', ({ x, tau, theta }) => {
    const [dTau, dTheta] = fopdtStepGradient(x, tau, theta);
    expect(dTau).toBeCloseTo((fopdtStep(x, tau + h, theta) - fopdtStep(x, tau - h, theta)) / (2 * h), 7);
    expect(dTheta).toBeCloseTo((fopdtStep(x, tau, theta + h) - fopdtStep(x, tau, theta - h)) / (2 * h), 7);
  });

  it.each([
    { x: 20, tau1: 10, tau2: 3, theta: 2 },
    { x: 20, tau1: 10, tau2: 9.999, theta: 2 },
  ])('sopdt gradient matches central differences at τ1=$tau1, τ2=$tau2', ({ x, tau1, tau2, theta }) => {
    const g = sopdtStepGradient(x, tau1, tau2, theta);
    const f = (a: number, b: number, c: number) => sopdtStep(x, a, b, c);
    expect(g[0]).toBeCloseTo((f(tau1 + h, tau2, theta) - f(tau1 - h, tau2, theta)) / (2 * h), 5);
    expect(g[1]).toBeCloseTo((f(tau1, tau2 + h, theta) - f(tau1, tau2 - h, theta)) / (2 * h), 5);
    expect(g[2]).toBeCloseTo((f(tau1, tau2, theta + h) - f(tau1, tau2, theta - h)) / (2 * h), 5);
  });
});
