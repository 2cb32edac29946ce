import { describe, expect, it } from 'vitest';
import { pidToTransferFunction } from '../../../src/lib/control/pid';
import { evaluateComplex } from '../../../src/lib/control/polynomial';
import type { PidController } from '../../../src/lib/control/types';

function at(c: PidController, w: number) {
  const g = pidToTransferFunction(c);
  const n = evaluateComplex(g.num, { re: 0, im: w });
  const d = evaluateComplex(g.den, { re: 0, im: w });
  const q = d.re * d.re + d.im * d.im;
  return { re: (n.re * d.re + n.im * d.im) / q, im: (n.im * d.re - n.re * d.im) / q };
}

describe('pidToTransferFunction', () => {
  // Each form evaluated at jw by hand from the contract formula (shared/api-v1.md), rel 1e-12.
  const rows: { c: PidController; w: number; value: (w: number) => { re: number; im: number } }[] = [
    {
      c: { form: 'ideal', kc: 2, ti: 5, td: 1, n: 8 }, w: 0.7,
      value: (w) => {
        const a = 1 / 8;
        const d = { re: (w * w * a) / (1 + a * a * w * w), im: w / (1 + a * a * w * w) };
        return { re: 2 * (1 + d.re), im: 2 * (-1 / (5 * w) + d.im) };
      },
    },
    {
      c: { form: 'parallel', kp: 1.5, ki: 0.2, kd: 3, tf: 0.4 }, w: 2,
      value: (w) => ({ re: 1.5 + (3 * w * w * 0.4) / (1 + 0.16 * w * w), im: -0.2 / w + (3 * w) / (1 + 0.16 * w * w) }),
    },
    {
      c: { form: 'series', kc: 0.8, ti: 10, td: 2, n: 10 }, w: 0.3,
      value: (w) => {
        const i = { re: 1, im: -1 / (10 * w) };
        const num = { re: 1, im: 2 * w };
        const den = { re: 1, im: 0.2 * w };
        const q = den.re * den.re + den.im * den.im;
        const lead = { re: (num.re * den.re + num.im * den.im) / q, im: (num.im * den.re - num.re * den.im) / q };
        return { re: 0.8 * (i.re * lead.re - i.im * lead.im), im: 0.8 * (i.re * lead.im + i.im * lead.re) };
      },
    },
  ];
  for (const row of rows) {
    it(`matches the contract formula for the ${row.c.form} form`, () => {
      const got = at(row.c, row.w);
      const want = row.value(row.w);
      expect(got.re).toBeCloseTo(want.re, 12);
      expect(got.im).toBeCloseTo(want.im, 12);
    });
  }

  it('drops integral action for ti 0 or absent and derivative for td 0, and defaults n to 10', () => {
    expect(pidToTransferFunction({ form: 'ideal', kc: 3 })).toEqual({ num: [3], den: [1], delay: 0 });
    expect(pidToTransferFunction({ form: 'ideal', kc: 3, ti: 0, td: 1 })).toEqual({ num: [3 * 1.1, 3], den: [0.1, 1], delay: 0 });
  });

  it('gives an improper controller for a parallel PID without filter (accepted where the loop is proper)', () => {
    const c = pidToTransferFunction({ form: 'parallel', kp: 1, ki: 0.5, kd: 2, tf: 0 });
    expect(c.num).toEqual([2, 1, 0.5]);
    expect(c.den).toEqual([1, 0]);
  });

  it('refuses negative times and a zero filter divisor, naming the field', () => {
    expect(() => pidToTransferFunction({ form: 'ideal', kc: 1, td: -1 })).toThrow(expect.objectContaining({ field: 'controller.td' }));
    expect(() => pidToTransferFunction({ form: 'series', kc: 1, td: 1, n: 0 })).toThrow(expect.objectContaining({ field: 'controller.n' }));
    expect(() => pidToTransferFunction({ form: 'parallel', kp: Infinity })).toThrow(expect.objectContaining({ field: 'controller.kp' }));
  });
});
