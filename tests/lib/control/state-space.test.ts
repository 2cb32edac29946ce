import { describe, expect, it } from 'vitest';
import { discretizeStates, toStateSpace } from '../../../src/lib/control/state-space';

describe('toStateSpace', () => {
  it('realizes (2s + 3)/(s² + 3s + 2) with D = 0 and the same transfer function C(sI − A)⁻¹B', () => {
    const ss = toStateSpace({ num: [2, 3], den: [1, 3, 2], delay: 0 });
    // At s = 1: G = 5/6. Solve (I − A)x = B for the 2×2 case by Cramer's rule.
    const [a11, a12, a21, a22] = ss.a;
    const m11 = 1 - a11, m12 = -a12, m21 = -a21, m22 = 1 - a22;
    const det = m11 * m22 - m12 * m21;
    const x1 = (ss.b[0] * m22 - m12 * ss.b[1]) / det;
    const x2 = (m11 * ss.b[1] - m21 * ss.b[0]) / det;
    expect(ss.c[0][0] * x1 + ss.c[0][1] * x2 + ss.d[0]).toBeCloseTo(5 / 6, 14);
    expect(ss.d[0]).toBe(0);
  });

  it('keeps the direct feedthrough of a biproper system', () => {
    expect(toStateSpace({ num: [4, 1], den: [2, 1], delay: 0 }).d[0]).toBe(2);
  });

  it('refuses an improper transfer function', () => {
    expect(() => toStateSpace({ num: [1, 0, 0], den: [1, 1], delay: 0 })).toThrow(/improper/);
  });
});

describe('discretizeStates', () => {
  it('gives phi = e^(−h/τ) and the ZOH gain 1 − e^(−h/τ) for 1/(τs + 1) (closed form)', () => {
    const ss = toStateSpace({ num: [1], den: [5, 1], delay: 0 });
    const d = discretizeStates(ss, 0.5);
    expect(d.phi[0]).toBeCloseTo(Math.exp(-0.1), 15);
    expect(ss.c[0][0] * (d.g0[0] + d.g1[0])).toBeCloseTo(1 - Math.exp(-0.1), 15);
  });
});
