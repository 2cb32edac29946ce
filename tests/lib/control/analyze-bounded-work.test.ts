import { describe, expect, it } from 'vitest';
import { analyze, type AnalyzeRequest } from '../../../src/lib/control/analyze';
import { discretize } from '../../../src/lib/control/discretize';
import { factor, phaseAt } from '../../../src/lib/control/frequency';
import { margins } from '../../../src/lib/control/margins';
import { nyquistUnstableCount } from '../../../src/lib/control/stability';
import { pidToTransferFunction } from '../../../src/lib/control/pid';
import type { PidController } from '../../../src/lib/control/types';
import { modelErrorOf } from './helpers';

// Each row is a loop that once hung or crashed the engine; each must now answer correctly
// (against the reference named in the row) or refuse with a ModelError, within the normal timeout.
const pid: PidController = { form: 'ideal', kc: 2.1, ti: 11, td: 0.8, n: 10 };
const lag10 = { num: [1], den: [10, 1], delay: 2 };

function binomial(n: number, k: number): number {
  let c = 1;
  for (let i = 1; i <= k; i++) c = (c * (n - k + i)) / i;
  return c;
}

function stepOf(req: AnalyzeRequest): { y: number[]; stable: boolean | undefined } {
  const r = analyze({ ...req, analyses: { step: { tFinal: 80, points: 801 }, poles: true } });
  return { y: r.step!.y, stable: r.stable };
}

describe('analyze', () => {
  const negligible = [
    { why: 'a 10 µs sensor lag', loop: { plant: lag10, sensor: { num: [1], den: [1e-5, 1], delay: 0 }, controller: pid }, reference: { plant: lag10, controller: pid } },
    { why: 'a 1 µs sensor lag', loop: { plant: lag10, sensor: { num: [1], den: [1e-6, 1], delay: 0 }, controller: pid }, reference: { plant: lag10, controller: pid } },
    { why: 'td = 1 µs (the derivative adds an impulse of area kc·td ≈ 2e-6)', loop: { plant: lag10, controller: { ...pid, td: 1e-6 } }, reference: { plant: lag10, controller: { ...pid, td: 0 } } },
    { why: 'a 1 µs lag in the third block of a series', loop: { plant: [lag10, { num: [1], den: [1, 1], delay: 0 }, { num: [1], den: [1e-6, 1], delay: 0 }], controller: pid }, reference: { plant: [lag10, { num: [1], den: [1, 1], delay: 0 }], controller: pid } },
    { why: 'a 1 µs sensor lag without dead time (stiff pole and derivative filter)', loop: { plant: { ...lag10, delay: 0 }, sensor: { num: [1], den: [1e-6, 1], delay: 0 }, controller: pid }, reference: { plant: { ...lag10, delay: 0 }, controller: pid } },
  ];
  // Reference: the same loop with the negligible part dropped; a lag τ changes the response by
  // about τ·max|dy/dt| (first-order perturbation, common practice), far below 1e-4 here.
  it.each(negligible)('answers a stable loop with $why like the loop without it', ({ loop, reference }) => {
    const got = stepOf(loop);
    const ref = stepOf(reference);
    expect(got.stable).toBe(true);
    expect(ref.stable).toBe(true);
    const worst = Math.max(...got.y.map((v, i) => Math.abs(v - ref.y[i])));
    expect(worst).toBeLessThan(1e-4);
  });

  const violent = [
    { why: 'plant 1/(s+1) with a dead time of 1e6 s', loop: { plant: { num: [1], den: [1, 1], delay: 1e6 }, controller: pid } },
    { why: 'process gain 1e11 with 2 s of dead time', loop: { plant: { num: [1], den: [1e-11], delay: 2 }, controller: pid } },
    { why: 'sensor gain −1.5e52 (positive feedback)', loop: { plant: lag10, sensor: { num: [-1.5e52], den: [0.5, 1], delay: 0 }, controller: pid } },
    { why: 'plant gain 1000, dead time 2 s, sensor 1/(0.5s+1)', loop: { plant: { num: [1], den: [1e-3], delay: 2 }, sensor: { num: [1], den: [0.5, 1], delay: 0 }, controller: pid } },
  ];
  it.each(violent)('answers the full analysis of $why as unstable with finite numbers', ({ loop }) => {
    const r = analyze(loop);
    expect(r.stable).toBe(false);
    expect(r.step!.info.finalValue).toBeNull();
    expect(r.step!.y.every(Number.isFinite)).toBe(true);
  });

  // (0.5s + 1)^k expanded: a block of order k (binomial coefficients).
  const lagPower = (k: number) => Array.from({ length: k + 1 }, (_, i) => binomial(k, i) * 0.5 ** (k - i));
  it('refuses the step of 20 blocks of order 20 in series (order 402 with the PID) at plant', () => {
    const plant = Array.from({ length: 20 }, () => ({ num: [1], den: lagPower(20), delay: 0.05 }));
    const e = modelErrorOf(() => analyze({ plant, controller: pid, analyses: { step: true } }));
    expect(e).toMatchObject({ code: 'invalid_request', field: 'plant' });
    // The frequency analyses of the same loop stay available.
    expect(analyze({ plant, controller: pid, analyses: { margins: true } }).margins).toBeDefined();
  });

  it('refuses 100 000 points of an order-62 response at analyses.step.points', () => {
    const plant = Array.from({ length: 3 }, () => ({ num: [1], den: lagPower(20), delay: 0 }));
    const e = modelErrorOf(() => analyze({ plant, controller: pid, analyses: { step: { points: 100000 } } }));
    expect(e.field).toBe('analyses.step.points');
  });

  it('refuses ti = 1e300 s with a ModelError instead of exhausting memory', () => {
    const e = modelErrorOf(() => analyze({ plant: lag10, controller: { ...pid, ti: 1e300 } }));
    expect(e.code).toBe('invalid_request');
    expect(e.message).toMatch(/decades apart/);
  });
});

describe('nyquistUnstableCount', () => {
  // With one gain crossover wc where |L_R| falls through 1, closed-loop root pairs cross into the
  // right half plane at the delays θk = (π + arg L_R(j·wc) + 2πk)/wc, k = 0, 1, … and never
  // back (stability switches of retarded loops: Cooke & van den Driessche 1986, "On zeroes of
  // some transcendental equations", Funkcialaj Ekvacioj 29 — cited from memory). So the count
  // of right-half-plane roots is 2·#{k ≥ 0 : θk < θ}.
  const rows = [
    { plant: { num: [1], den: [1, 1] }, delay: 0.05 },
    { plant: { num: [1], den: [1, 1] }, delay: 2 },
    { plant: { num: [1], den: [1, 1] }, delay: 37 },
    { plant: { num: [1], den: [1, 1] }, delay: 1e6 },
    { plant: { num: [1000], den: [0.5, 1] }, delay: 2 },
  ];
  it.each(rows)('counts the unstable roots of the PID on $plant.den with a dead time of $delay s', ({ plant, delay }) => {
    const c = pidToTransferFunction(pid, 'controller');
    const rational = factor([c, { ...plant, delay: 0 }]);
    const crossings = margins(rational).gainCrossovers;
    expect(crossings).toHaveLength(1);
    const wc = crossings[0];
    const phase = ((phaseAt(rational, wc) * Math.PI) / 180) % (2 * Math.PI);
    const first = (Math.PI + phase + 2 * Math.PI * Math.ceil(-(Math.PI + phase) / (2 * Math.PI))) / wc;
    const expected = delay > first ? 2 * (Math.floor(((delay - first) * wc) / (2 * Math.PI)) + 1) : 0;
    expect(nyquistUnstableCount(factor([c, { ...plant, delay }]))).toBe(expected);
  });
});

describe('discretize', () => {
  it('refuses ts = 1.79e308 s with a ModelError instead of squaring forever', () => {
    const e = modelErrorOf(() => discretize({ tf: { num: [1], den: [10, 1], delay: 0 }, ts: 1.79e308, method: 'zoh' }));
    expect(e.field).toBe('ts');
  });

  it('refuses a dead time whose sample count overflows (delay/ts = Infinity)', () => {
    const e = modelErrorOf(() => discretize({ tf: { num: [1], den: [10, 1], delay: 1e300 }, ts: 1e-300, method: 'zoh' }));
    expect(e.field).toBe('tf.delay');
  });
});
