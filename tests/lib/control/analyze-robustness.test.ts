import { describe, expect, it } from 'vitest';
import { analyze, type AnalyzeResponse } from '../../../src/lib/control/analyze';
import { ModelError } from '../../../src/lib/control/types';

/** Every number in a response is finite (null is allowed): no silent NaN or Infinity. */
function allFinite(r: AnalyzeResponse): boolean {
  const walk = (v: unknown): boolean => {
    if (v === null) return true;
    if (typeof v === 'number') return Number.isFinite(v);
    if (Array.isArray(v)) return v.every(walk);
    if (typeof v === 'object') return Object.values(v as object).every(walk);
    return true;
  };
  return walk(r);
}

const everything = { step: true, frequency: true, margins: true, poles: true } as const;

describe('analyze', () => {
  it('gives null step metrics for a pure integrator (integrating open path)', () => {
    const r = analyze({ plant: { num: [0.05], den: [1, 0], delay: 3 }, analyses: everything });
    expect(r.step?.info).toEqual({ finalValue: null, riseTime: null, settlingTime: null, overshootPct: null, peak: null, peakTime: null });
    expect(r.stable).toBe(false);
    expect(allFinite(r)).toBe(true);
  });

  it('gives null metrics and stable false for an unstable closed loop', () => {
    const r = analyze({ plant: { num: [1], den: [1, 0], delay: 2 }, controller: { form: 'ideal', kc: 1.5 }, analyses: everything });
    expect(r.stable).toBe(false);
    expect(r.step?.info.finalValue).toBeNull();
    expect(allFinite(r)).toBe(true);
  });

  it('reports a biproper response that starts away from zero as the contract defines it', () => {
    const r = analyze({ plant: { num: [2, 1], den: [1, 1] }, analyses: { step: { tFinal: 10, points: 1001 } } });
    expect(r.step?.y[0]).toBeCloseTo(2, 12);
    expect(r.step?.info.finalValue).toBe(1);
    expect(r.step?.info.peak).toBeCloseTo(2, 12);
    expect(r.step?.info.overshootPct).toBeCloseTo(100, 9);
  });

  it('gives grid-independent step metrics (201 vs 5001 points, rel 1e-3)', () => {
    const base = { plant: { num: [1.6], den: [40, 1], delay: 7 }, controller: { form: 'ideal' as const, kc: 1.2, ti: 35 } };
    const a = analyze({ ...base, analyses: { step: { tFinal: 300, points: 201 } } }).step!.info;
    const b = analyze({ ...base, analyses: { step: { tFinal: 300, points: 5001 } } }).step!.info;
    expect(Math.abs(a.riseTime! - b.riseTime!) / b.riseTime!).toBeLessThan(1e-3);
    expect(Math.abs(a.settlingTime! - b.settlingTime!) / b.settlingTime!).toBeLessThan(1e-3);
    expect(Math.abs(a.overshootPct! - b.overshootPct!)).toBeLessThan(0.05);
  });

  it('gives the phase of 1/s³ as −270°', () => {
    const r = analyze({ plant: { num: [1], den: [1, 0, 0, 0] }, analyses: { frequency: { w: [0.1, 1, 10] } } });
    r.frequency!.phaseDeg.forEach((p) => expect(p).toBeCloseTo(-270, 12));
  });

  it('finds the margins of a tenth-order plant given expanded: K/(s+1)^10, phase crossover tan 18° (closed form)', () => {
    const den = [1, 10, 45, 120, 210, 252, 210, 120, 45, 10, 1];
    const r = analyze({ plant: { num: [1.2], den }, analyses: { margins: true } });
    const w = Math.tan(Math.PI / 10);
    expect(r.margins!.phaseCrossover!).toBeCloseTo(w, 10);
    expect(r.margins!.gainMargin! / ((1 + w * w) ** 5 / 1.2)).toBeCloseTo(1, 9);
  });

  it('reports repeated poles as repeated: (s+1)^4', () => {
    const r = analyze({ plant: { num: [1], den: [1, 4, 6, 4, 1] }, analyses: { poles: true } });
    expect(r.poles).toEqual(new Array(4).fill({ re: -1, im: 0 }));
    expect(r.stable).toBe(true);
  });

  it('handles time constants from 1 ms to 10 000 s in one model', () => {
    const r = analyze({ plant: [{ num: [2], den: [10000, 1] }, { num: [1], den: [0.001, 1] }], controller: { form: 'ideal', kc: 50, ti: 10000 }, analyses: everything });
    expect(r.stable).toBe(true);
    expect(r.step!.info.finalValue).toBeCloseTo(1, 12);
    expect(r.step!.info.settlingTime).not.toBeNull();
    // With the PI zero on the slow pole, L ≈ 0.01/s: crossover 0.01 rad/s, PM ≈ 90°.
    expect(r.margins!.gainCrossover!).toBeCloseTo(0.01, 6);
    expect(r.margins!.phaseMarginDeg!).toBeCloseTo(90, 2);
    expect(allFinite(r)).toBe(true);
  });

  it('keeps a near cancellation as given: the pole and the zero both appear, the response is nearly first order', () => {
    const r = analyze({ plant: [{ num: [1, 1.0001], den: [1, 1] }, { num: [1], den: [10, 1] }], analyses: { ...everything, step: { tFinal: 80, points: 801 } } });
    expect(r.poles!.map((p) => p.re)).toEqual([expect.closeTo(-1, 12), expect.closeTo(-0.1, 12)]);
    expect(r.zeros![0].re).toBeCloseTo(-1.0001, 12);
    r.step!.t.forEach((t, i) => expect(Math.abs(r.step!.y[i] - 1.0001 * (1 - Math.exp(-t / 10)))).toBeLessThan(2e-4));
  });

  it('controls a pure integrator with dead time (IPDT with PI): setpoint settles at 1, a load is rejected to 0', () => {
    const base = { plant: { num: [0.2], den: [1, 0], delay: 3 }, controller: { form: 'ideal' as const, kc: 0.25, ti: 20 } };
    const sp = analyze({ ...base, analyses: { step: true } });
    expect(sp.step!.info.finalValue).toBe(1);
    expect(sp.step!.info.settlingTime).not.toBeNull();
    const load = analyze({ ...base, analyses: { step: { input: 'load' } } });
    expect(load.step!.info.finalValue).toBe(0);
    expect(load.step!.info.peak!).toBeGreaterThan(0);
  });

  it('shows the inverse response of a right-half-plane zero', () => {
    const r = analyze({ plant: { num: [-2, 1], den: [3, 4, 1] }, analyses: { step: true, margins: true } });
    expect(Math.min(...r.step!.y)).toBeLessThan(-0.1);
    expect(r.step!.info.finalValue).toBe(1);
    expect(allFinite(r)).toBe(true);
  });

  it('stabilizes an open-loop unstable plant with PI and knows it', () => {
    const r = analyze({ plant: { num: [1], den: [1, -1], delay: 0.1 }, controller: { form: 'ideal', kc: 3, ti: 4 }, analyses: everything });
    expect(r.poles!.some((p) => p.re > 0)).toBe(true);
    expect(r.stable).toBe(true);
    expect(r.step!.info.finalValue).toBeCloseTo(1, 12);
  });

  it('chooses a horizon that settles for dead time 100 times the time constant', () => {
    const r = analyze({ plant: { num: [1], den: [0.1, 1], delay: 10 }, controller: { form: 'ideal', kc: 0.2, ti: 5 }, analyses: { step: true } });
    expect(r.step!.info.settlingTime).not.toBeNull();
    expect(r.step!.info.settlingTime!).toBeLessThan(r.step!.tFinal);
    expect(r.step!.y[r.step!.y.length - 1]).toBeCloseTo(1, 3);
  });

  it('accepts an unfiltered parallel PID where the closed loop is proper, and refuses it where it is not', () => {
    const ok = analyze({ plant: { num: [1], den: [2, 3, 1], delay: 0.5 }, controller: { form: 'parallel', kp: 1, ki: 0.4, kd: 0.5, tf: 0 }, analyses: everything });
    expect(ok.stable).toBe(true);
    expect(allFinite(ok)).toBe(true);
    expect(() => analyze({ plant: { num: [1], den: [1], delay: 0.5 }, controller: { form: 'parallel', kp: 1, kd: 0.5 }, analyses: { step: true } })).toThrow(ModelError);
  });

  it('never answers NaN across a sweep of awkward loops', () => {
    const plants = [
      { num: [1], den: [1, 0, 0] },
      { num: [1, 0], den: [1, 2, 1] },
      { num: [0], den: [1, 1] },
      { num: [1], den: [1, 0.0001, 1], delay: 1 },
      { num: [-3], den: [5, 1], delay: 2 },
      { num: [1e6], den: [1, 1e3, 1e-3] },
    ];
    for (const plant of plants) {
      for (const controller of [undefined, { form: 'ideal' as const, kc: 0.5, ti: 10, td: 1 }]) {
        const r = analyze({ plant, controller, analyses: everything });
        expect(allFinite(r)).toBe(true);
      }
    }
  });
});

describe('analyze (growing and improper loops)', () => {
  it('chooses a horizon that shows a fast-growing unstable response without overflowing', () => {
    const r = analyze({ plant: { num: [1], den: [100, 1] }, controller: { form: 'ideal', kc: -500 }, analyses: { step: true, poles: true } });
    expect(r.stable).toBe(false);
    expect(r.step!.y.every(Number.isFinite)).toBe(true);
    expect(Math.abs(r.step!.y[r.step!.y.length - 1])).toBeGreaterThan(10);
  });

  it('refuses an improper loop with dead time even when no step is asked for', () => {
    expect(() => analyze({ plant: { num: [2], den: [1], delay: 1 }, controller: { form: 'parallel', kp: 1, kd: 1 }, analyses: { margins: true } })).toThrow(expect.objectContaining({ code: 'invalid_model', field: 'controller' }));
  });

  it('accepts an unfiltered derivative on a biproper plant without dead time when the closed loop is proper', () => {
    const r = analyze({ plant: { num: [1, 2], den: [1, 1] }, controller: { form: 'parallel', kp: 1, ki: 1, kd: 0.5 }, analyses: { step: { tFinal: 10 }, poles: true } });
    expect(r.stable).toBe(true);
    expect(r.step!.info.finalValue).toBeCloseTo(1, 12);
  });
});
