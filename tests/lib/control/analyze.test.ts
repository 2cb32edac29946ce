import { describe, expect, it } from 'vitest';
import { analyze } from '../../../src/lib/control/analyze';
import { ModelError } from '../../../src/lib/control/types';

const contractExample = {
  plant: { num: [1], den: [10, 1], delay: 2 },
  sensor: { num: [1], den: [0.5, 1] },
  controller: { form: 'ideal' as const, kc: 2.1, ti: 11, td: 0.8, n: 10 },
  analyses: { step: { tFinal: 120, points: 1201, input: 'setpoint' as const }, frequency: { w: [0.01, 0.1, 1] }, margins: true, poles: true },
};

function fieldOf(fn: () => unknown): { code: string; field?: string } {
  try {
    fn();
  } catch (e) {
    if (e instanceof ModelError) return { code: e.code, field: e.field };
    throw e;
  }
  throw new Error('expected a ModelError');
}

describe('analyze', () => {
  it('answers the contract example with every requested block', () => {
    const r = analyze(contractExample);
    expect(r.step?.t).toHaveLength(1201);
    expect(r.step?.t[1200]).toBe(120);
    expect(r.step?.info.finalValue).toBeCloseTo(1, 12);
    expect(r.frequency?.w).toEqual([0.01, 0.1, 1]);
    expect(r.margins?.gainCrossover).toBeGreaterThan(0);
    expect(r.poles?.length).toBe(4);
    expect(r.stable).toBe(true);
  });

  it('gives the frequency response of L = C·G·H: |L| at w from the factors, phase from angles', () => {
    // Hand evaluation of the contract example at w = 1 rad/s (closed form of each factor).
    const w = 1;
    const a = 0.08;
    const c = { re: 2.1 * (1 + (0.8 * w * w * a) / (1 + a * a * w * w)), im: 2.1 * (-1 / (11 * w) + (0.8 * w) / (1 + a * a * w * w)) };
    const mag = Math.hypot(c.re, c.im) / Math.hypot(1, 10 * w) / Math.hypot(1, 0.5 * w);
    const r = analyze({ ...contractExample, analyses: { frequency: { w: [w] } } });
    expect(r.frequency?.mag[0]).toBeCloseTo(mag, 12);
    const phase = (Math.atan2(c.im, c.re) - Math.atan(10 * w) - Math.atan(0.5 * w) - 2 * w) * (180 / Math.PI);
    expect(r.frequency?.phaseDeg[0]).toBeCloseTo(phase, 10);
  });

  it('treats an array plant as a series connection whose order does not matter', () => {
    const a = analyze({ plant: [{ num: [2], den: [3, 1], delay: 1 }, { num: [1], den: [1, 0.5] }], controller: { form: 'ideal', kc: 0.4, ti: 5 } });
    const b = analyze({ plant: [{ num: [1], den: [1, 0.5] }, { num: [2], den: [3, 1], delay: 1 }], controller: { form: 'ideal', kc: 0.4, ti: 5 } });
    expect(a.margins?.phaseMarginDeg).toBeCloseTo(b.margins!.phaseMarginDeg!, 9);
    a.step!.y.forEach((v, i) => expect(v).toBeCloseTo(b.step!.y[i], 9));
  });

  it('names the offending field with a dotted path', () => {
    const table: [string, () => unknown, string, string][] = [
      ['zero den coefficient list', () => analyze({ plant: [{ num: [1], den: [1, 1] }, { num: [1], den: [0, 0] }] }), 'invalid_model', 'plant.1.den'],
      ['non-finite coefficient', () => analyze({ plant: { num: [1], den: [NaN, 1] } }), 'invalid_model', 'plant.den.0'],
      ['improper plant', () => analyze({ plant: { num: [1, 0, 0], den: [1, 1] } }), 'invalid_model', 'plant.num'],
      ['negative delay', () => analyze({ plant: { num: [1], den: [1, 1], delay: -1 } }), 'invalid_model', 'plant.delay'],
      ['order above 20', () => analyze({ plant: { num: [1], den: new Array(22).fill(1) } }), 'invalid_model', 'plant.den'],
      ['negative integral time', () => analyze({ plant: { num: [1], den: [1, 1] }, controller: { form: 'ideal', kc: 1, ti: -3 } }), 'invalid_request', 'controller.ti'],
      ['too few points', () => analyze({ plant: { num: [1], den: [1, 1] }, analyses: { step: { points: 1 } } }), 'invalid_request', 'analyses.step.points'],
      ['zero frequency', () => analyze({ plant: { num: [1], den: [1, 1] }, analyses: { frequency: { w: [1, 0] } } }), 'invalid_request', 'analyses.frequency.w.1'],
      ['negative tFinal', () => analyze({ plant: { num: [1], den: [1, 1] }, analyses: { step: { tFinal: -5 } } }), 'invalid_request', 'analyses.step.tFinal'],
      ['sensor with bad den', () => analyze({ plant: { num: [1], den: [1, 1] }, sensor: { num: [1], den: [] } }), 'invalid_model', 'sensor.den'],
    ];
    for (const [, fn, code, field] of table) expect(fieldOf(fn)).toEqual({ code, field });
  });
});
