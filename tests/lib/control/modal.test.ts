import { describe, expect, it } from 'vitest';
import { discretizeModalCubic, modalForm, phiFunctions } from '../../../src/lib/control/modal';
import { discretizeCubic } from '../../../src/lib/control/state-space';
import { roots } from '../../../src/lib/control/roots';
import type { TransferFunction } from '../../../src/lib/control/types';

const tf = (num: number[], den: number[]): TransferFunction => ({ num, den, delay: 0 });
const modalOf = (g: TransferFunction) => modalForm(g, roots(g.den));

describe('modalForm', () => {
  it('gives the partial fractions of 1/((s+1)(s+2)) = 1/(s+1) − 1/(s+2) (handbook partial-fraction expansion)', () => {
    const m = modalOf(tf([1], [1, 3, 2]))!;
    expect(m.diagonal).toBe(true);
    const byPole = new Map([0, 1].map((i) => [Math.round(m.a[i * 2 + i]), m.c[0][i]]));
    expect(byPole.get(-1)).toBeCloseTo(1, 14);
    expect(byPole.get(-2)).toBeCloseTo(-1, 14);
    expect(m.d[0]).toBe(0);
  });

  it('keeps the direct term of a biproper block: (2s + 3)/(s + 1) = 2 + 1/(s + 1) (polynomial division)', () => {
    const m = modalOf(tf([2, 3], [1, 1]))!;
    expect(m.d[0]).toBeCloseTo(2, 15);
    expect(m.c[0][0]).toBeCloseTo(1, 14);
  });

  it('takes an integrator as a mode at λ = 0: PI 0.5(1 + 1/(10s)) = 0.5 + 0.05/s', () => {
    const m = modalOf(tf([5, 0.5], [10, 0]))!;
    expect(m.d[0]).toBeCloseTo(0.5, 15);
    expect(m.c[0][0]).toBeCloseTo(0.05, 15);
  });

  it('declines repeated, close or complex poles, where residues cancel (the dense form is kept)', () => {
    expect(modalOf(tf([1], [1, 2, 1]))).toBeNull();
    expect(modalOf(tf([1], [1, 2.05, 1.05]))).toBeNull();
    expect(modalOf(tf([1], [1, 0.4, 1]))).toBeNull();
  });
});

describe('discretizeModalCubic', () => {
  it('equals the augmented matrix exponential of the same diagonal system (Van Loan 1978 construction in state-space.ts)', () => {
    const lambda = [-40, -5, -1.9, -0.3, 0, 0.8, 2.5];
    const n = lambda.length;
    const a = new Float64Array(n * n);
    lambda.forEach((l, i) => (a[i * n + i] = l));
    const ss = { n, a, b: new Float64Array(n).fill(1), c: [new Float64Array(n).fill(1)], d: [0], diagonal: true };
    for (const h of [0.01, 0.4, 1.05, 3]) {
      const modal = discretizeModalCubic(ss, h);
      const dense = discretizeCubic(ss, h);
      for (let i = 0; i < n; i++) {
        // Relative, down to an absolute floor: e^(−120) from scaling and squaring is good to ~1e-62 only.
        const e = dense.phi[i * n + i];
        expect(Math.abs(modal.phi[i] - e)).toBeLessThan(Math.max(1e-13 * Math.abs(e), 1e-16));
        for (const key of ['ge0', 'ge1', 'gd0', 'gd1'] as const) {
          const scale = Math.max(1, Math.abs(dense[key][i]));
          expect(Math.abs(modal[key][i] - dense[key][i])).toBeLessThan(1e-12 * scale);
        }
      }
    }
  });

  it('has φ-functions continuous where the series hands over to the recurrence (|z| = 2) and φₖ(0) = 1/k! (definition)', () => {
    expect(phiFunctions(0)).toEqual([1, 0.5, 1 / 6, 1 / 24]);
    for (const z of [-2, 2]) {
      // A few ulps either side: the functions move by ~1e-15 there, the two methods must agree.
      const below = phiFunctions(z * (1 - 2e-15));
      const above = phiFunctions(z * (1 + 2e-15));
      below.forEach((v, k) => expect(Math.abs(v - above[k])).toBeLessThan(2e-14 * Math.abs(v)));
    }
    // φ₁(z) = (e^z − 1)/z exactly.
    expect(phiFunctions(-0.7)[0]).toBeCloseTo(Math.expm1(-0.7) / -0.7, 15);
  });
});
