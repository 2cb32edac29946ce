import { describe, expect, it } from 'vitest';
import { toIdeal, toParallel, toSeries } from '../../../src/lib/control/pid-forms';
import { pidToTransferFunction } from '../../../src/lib/control/pid';
import { evaluateComplex } from '../../../src/lib/control/polynomial';
import type { PidController } from '../../../src/lib/control/types';

function value(c: PidController, w: number) {
  const g = pidToTransferFunction(c);
  const n = evaluateComplex(g.num, { re: 0, im: w });
  const d = evaluateComplex(g.den, { re: 0, im: w });
  const q = d.re * d.re + d.im * d.im;
  return { re: (n.re * d.re + n.im * d.im) / q, im: (n.im * d.re - n.re * d.im) / q };
}

function same(a: PidController, b: PidController) {
  for (const w of [0.01, 0.3, 2, 40]) {
    const x = value(a, w), y = value(b, w);
    expect(x.re).toBeCloseTo(y.re, 9);
    expect(x.im).toBeCloseTo(y.im, 9);
  }
}

describe('toIdeal', () => {
  it('converts series to ideal exactly, filter included; unfiltered it is the textbook kc(ti+td)/ti, ti+td, ti·td/(ti+td)', () => {
    const s: PidController = { form: 'series', kc: 1.2, ti: 20, td: 3, n: 10 };
    same(s, toIdeal(s)!);
    const big = toIdeal({ form: 'series', kc: 1.2, ti: 20, td: 3, n: 1e9 })!;
    // Åström & Hägglund, Advanced PID Control (2006), §3.4 conversion formulas.
    expect(big.kc).toBeCloseTo((1.2 * 23) / 20, 6);
    expect(big.ti).toBeCloseTo(23, 6);
    expect(big.td).toBeCloseTo(60 / 23, 6);
  });

  it('converts parallel to ideal and answers null without proportional action', () => {
    const p: PidController = { form: 'parallel', kp: 2, ki: 0.1, kd: 4, tf: 0.2 };
    same(p, toIdeal(p)!);
    expect(toIdeal({ form: 'parallel', kp: 0, ki: 1 })).toBeNull();
  });
});

describe('toParallel', () => {
  it('converts ideal and series to parallel exactly', () => {
    const i: PidController = { form: 'ideal', kc: 0.7, ti: 12, td: 2, n: 8 };
    same(i, toParallel(i)!);
    const s: PidController = { form: 'series', kc: 0.7, ti: 12, td: 2, n: 8 };
    same(s, toParallel(s)!);
  });
});

describe('toSeries', () => {
  it('converts ideal to series when its zeros are real, and answers null when they are complex', () => {
    const i: PidController = { form: 'ideal', kc: 1, ti: 20, td: 2, n: 10 };
    same(i, toSeries(i)!);
    expect(toSeries({ form: 'ideal', kc: 1, ti: 2, td: 2, n: 10 })).toBeNull();
  });
});
