import { describe, expect, it } from 'vitest';
import { stepInfo } from '../../../src/lib/control/step-info';
import { stepResponse } from '../../../src/lib/control/simulate';
import { timeGrid } from '../../../src/lib/control/time-grid';

describe('stepInfo', () => {
  // Second-order closed forms (Ogata, Modern Control Engineering, §5-3): overshoot
  // e^(−πζ/√(1−ζ²)), peak time π/(ωn√(1−ζ²)). Tolerance: 1e-4 relative on a 20 001-point grid.
  const rows = [
    { zeta: 0.2, wn: 1 },
    { zeta: 0.5, wn: 3 },
    { zeta: 0.7, wn: 0.05 },
  ];
  for (const { zeta, wn } of rows) {
    it(`gives the closed-form overshoot and peak time for ζ = ${zeta}, ωn = ${wn}`, () => {
      const tFinal = 20 / (zeta * wn);
      const t = timeGrid(tFinal, 20001);
      const r = stepResponse({ num: [wn * wn], den: [1, 2 * zeta * wn, wn * wn], delay: 0 }, t);
      const info = stepInfo(t, r.y, { finalValue: 1 });
      const os = 100 * Math.exp((-Math.PI * zeta) / Math.sqrt(1 - zeta * zeta));
      const tp = Math.PI / (wn * Math.sqrt(1 - zeta * zeta));
      expect(info.overshootPct! / os).toBeCloseTo(1, 4);
      expect(info.peakTime! / tp).toBeCloseTo(1, 3);
      expect(info.peak!).toBeCloseTo(1 + os / 100, 6);
    });
  }

  it('gives FOPDT rise time τ·ln 9 and 2 % settling time θ + τ·ln 50 (closed form)', () => {
    const tau = 12, theta = 3;
    const t = timeGrid(150, 3001);
    const r = stepResponse({ num: [2], den: [tau, 1], delay: theta }, t);
    const info = stepInfo(t, r.y, { finalValue: 2 });
    expect(info.riseTime!).toBeCloseTo(tau * Math.log(9), 3);
    expect(info.settlingTime!).toBeCloseTo(theta + tau * Math.log(50), 3);
    expect(info.overshootPct).toBe(0);
  });

  it('does not depend on the grid: rise time on 201 and 20 001 points agree to 1e-3 (linear interpolation)', () => {
    const g = { num: [1], den: [5, 1], delay: 1.3 };
    const a = stepInfo(timeGrid(40, 201), stepResponse(g, timeGrid(40, 201)).y, { finalValue: 1 });
    const b = stepInfo(timeGrid(40, 20001), stepResponse(g, timeGrid(40, 20001)).y, { finalValue: 1 });
    expect(Math.abs(a.riseTime! - b.riseTime!)).toBeLessThan(1e-3 * b.riseTime!);
    expect(Math.abs(a.settlingTime! - b.settlingTime!)).toBeLessThan(1e-3 * b.settlingTime!);
  });

  it('is all null when the final value is null (unstable or integrating)', () => {
    expect(stepInfo([0, 1, 2], [0, 1, 2], { finalValue: null })).toEqual({ finalValue: null, riseTime: null, settlingTime: null, overshootPct: null, peak: null, peakTime: null });
  });

  it('gives only the signed peak of largest magnitude when the final value is 0 (contract rule)', () => {
    const info = stepInfo([0, 1, 2, 3, 4], [0, 0.3, -0.5, 0.2, 0], { finalValue: 0 });
    expect(info).toEqual({ finalValue: 0, riseTime: null, settlingTime: null, overshootPct: null, peak: -0.5, peakTime: 2 });
  });

  it('measures a negative final value with the most negative peak', () => {
    const t = timeGrid(30, 3001);
    const r = stepResponse({ num: [-1], den: [1, 0.8, 1], delay: 0 }, t);
    const info = stepInfo(t, r.y, { finalValue: -1 });
    expect(info.peak!).toBeLessThan(-1);
    expect(info.overshootPct! / (100 * Math.exp((-Math.PI * 0.4) / Math.sqrt(1 - 0.16)))).toBeCloseTo(1, 3);
  });

  it('measures from the initial value for a response starting away from zero (offset-invariant)', () => {
    const t = timeGrid(20, 401);
    const y = stepResponse({ num: [1], den: [2, 1], delay: 0 }, t).y;
    const base = stepInfo(t, y, { finalValue: 1 });
    const shifted = stepInfo(t, y.map((v) => v + 50), { finalValue: 51, initialValue: 50 });
    expect(shifted.riseTime).toBeCloseTo(base.riseTime!, 12);
    expect(shifted.settlingTime).toBeCloseTo(base.settlingTime!, 12);
    expect(shifted.overshootPct).toBeCloseTo(base.overshootPct!, 12);
  });

  it('reports a null settling time when the response has not settled by tFinal', () => {
    const t = timeGrid(5, 101);
    const y = stepResponse({ num: [1], den: [10, 1], delay: 0 }, t).y;
    expect(stepInfo(t, y, { finalValue: 1 }).settlingTime).toBeNull();
  });

  it('takes the band and rise levels as options', () => {
    const t = timeGrid(100, 10001);
    const y = stepResponse({ num: [1], den: [10, 1], delay: 0 }, t).y;
    const info = stepInfo(t, y, { finalValue: 1, settlingBand: 0.05, riseLimits: [0.05, 0.95] });
    expect(info.settlingTime!).toBeCloseTo(10 * Math.log(20), 2);
    expect(info.riseTime!).toBeCloseTo(10 * Math.log(19), 2);
  });
});
