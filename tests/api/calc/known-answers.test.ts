/**
 * End to end over HTTP against the built server and the real engine: answers known in closed
 * form or from the contract's own formulas. Each row names its source.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RunningServer } from '../../support/server';
import { postCalc, startCalcServer } from '../../support/calc-http';

let server: RunningServer;
beforeAll(async () => {
  server = await startCalcServer();
});
afterAll(async () => server?.stop());

const post = (route: string, body: unknown) => postCalc(server.url, route, body);

const deg = (rad: number) => (rad * 180) / Math.PI;
const relClose = (actual: number, expected: number, rel: number) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));

describe('POST /api/v1/calc/analyze margins of K·e^(−θs)/s', () => {
  // Closed form (|L| = K/w, phase = −90° − wθ): gain crossover K, PM = 90° − Kθ·180/π,
  // phase crossover π/(2θ), GM = π/(2Kθ), delay margin = PM(rad)/K. Source: derived from
  // the integrator-plus-dead-time frequency response (Åström & Murray, Feedback Systems, 2008,
  // ch. 9, example of a delay in a loop); the form of the check is the product brief's.
  const cases = [
    { k: 0.5, theta: 1 },
    { k: 0.2, theta: 3 },
    { k: 0.05, theta: 10 },
  ];
  it.each(cases)('matches the closed form for K = $k, θ = $theta s', async ({ k, theta }) => {
    const out = await post('analyze', { plant: { num: [k], den: [1, 0], delay: theta }, analyses: { margins: true } });
    const m = out.margins;
    relClose(m.gainCrossover, k, 1e-6);
    relClose(m.phaseMarginDeg, 90 - deg(k * theta), 1e-6);
    relClose(m.phaseCrossover, Math.PI / (2 * theta), 1e-6);
    relClose(m.gainMargin, Math.PI / (2 * k * theta), 1e-6);
    relClose(m.gainMarginDb, 20 * Math.log10(Math.PI / (2 * k * theta)), 1e-6);
    relClose(m.delayMargin, (Math.PI / 2 - k * theta) / k, 1e-6);
  });
});

describe('POST /api/v1/calc/analyze frequency response', () => {
  it('gives 1/s³ a phase of −270° (continuous phase, contract definition), magnitude 1/w³', async () => {
    const out = await post('analyze', { plant: { num: [1], den: [1, 0, 0, 0] }, analyses: { frequency: { w: [0.5, 1, 2] } } });
    expect(out.frequency.phaseDeg).toEqual([-270, -270, -270].map((v) => expect.closeTo(v, 9)));
    out.frequency.w.forEach((w: number, i: number) => relClose(out.frequency.mag[i], 1 / w ** 3, 1e-9));
  });

  it('subtracts w·delay in degrees for a pure dead time (contract definition)', async () => {
    const out = await post('analyze', { plant: { num: [2], den: [1], delay: 0.5 }, analyses: { frequency: { w: [0.1, 1, 10] } } });
    [0.1, 1, 10].forEach((w, i) => {
      expect(out.frequency.phaseDeg[i]).toBeCloseTo(-deg(w * 0.5), 8);
      expect(out.frequency.mag[i]).toBeCloseTo(2, 12);
    });
  });
});

describe('POST /api/v1/calc/analyze step responses', () => {
  it('follows K(1 − e^(−(t−θ)/τ)) for an FOPDT open path, with its rise and settling times', async () => {
    // Closed form of the first-order step with dead time; 10–90 % rise τ·ln 9 and 2 % settling
    // θ + τ·ln 50 follow from it (common practice, e.g. Seborg et al., Process Dynamics and Control).
    const [k, tau, theta] = [1.8, 12, 4];
    const out = await post('analyze', { plant: { num: [k], den: [tau, 1], delay: theta }, analyses: { step: { tFinal: 120, points: 1201 } } });
    const { t, y, info } = out.step;
    expect(t).toHaveLength(1201);
    expect(t[1200]).toBeCloseTo(120, 12);
    t.forEach((ti: number, i: number) => {
      const exact = ti < theta ? 0 : k * (1 - Math.exp(-(ti - theta) / tau));
      expect(Math.abs(y[i] - exact)).toBeLessThan(1e-6 * k);
    });
    relClose(info.finalValue, k, 1e-9);
    relClose(info.riseTime, tau * Math.log(9), 1e-3);
    relClose(info.settlingTime, theta + tau * Math.log(50), 1e-3);
    expect(info.overshootPct).toBeCloseTo(0, 6);
  });

  it('overshoots by e^(−πζ/√(1−ζ²)) with its peak at π/(ωn√(1−ζ²)) for a second-order system', async () => {
    // Standard second-order step response (Ogata, Modern Control Engineering, ch. 5).
    const [zeta, wn] = [0.4, 0.5];
    const out = await post('analyze', {
      plant: { num: [wn * wn], den: [1, 2 * zeta * wn, wn * wn] },
      analyses: { step: { tFinal: 60, points: 6001 } },
    });
    const info = out.step.info;
    const root = Math.sqrt(1 - zeta * zeta);
    relClose(info.overshootPct, 100 * Math.exp((-Math.PI * zeta) / root), 1e-4);
    relClose(info.peakTime, Math.PI / (wn * root), 1e-3);
    relClose(info.peak, 1 + Math.exp((-Math.PI * zeta) / root), 1e-5);
  });

  it('closes a proportional loop around 1/(s+1): Y/R = kc/(s+1+kc), Y/D = 1/(s+1+kc)', async () => {
    // Closed form of first-order feedback; final values kc/(1+kc) and 1/(1+kc).
    const kc = 4;
    const base = { plant: { num: [1], den: [1, 1] }, controller: { form: 'ideal', kc } };
    const sp = await post('analyze', { ...base, analyses: { step: { tFinal: 3, points: 301 }, poles: true } });
    sp.step.t.forEach((ti: number, i: number) => {
      expect(sp.step.y[i]).toBeCloseTo((kc / (1 + kc)) * (1 - Math.exp(-(1 + kc) * ti)), 6);
    });
    expect(sp.step.info.finalValue).toBeCloseTo(kc / (1 + kc), 9);
    expect(sp.stable).toBe(true);
    // Poles of L = C·G (a P controller adds none): the plant's −1 (contract: poles of L as given).
    expect(sp.poles).toEqual([{ re: expect.closeTo(-1, 9), im: expect.closeTo(0, 9) }]);
    const load = await post('analyze', { ...base, analyses: { step: { tFinal: 3, points: 301, input: 'load' } } });
    expect(load.step.info.finalValue).toBeCloseTo(1 / (1 + kc), 9);
  });

  it('calls a PI loop on an integrating plant with a load step final value 0 (integral action)', async () => {
    // Contract: finalValue 0 for a load step rejected by integral action; then rise, settling
    // and overshoot are null and peak is the signed value of largest magnitude.
    const out = await post('analyze', {
      plant: { num: [0.1], den: [1, 0], delay: 1 },
      controller: { form: 'ideal', kc: 2, ti: 20 },
      analyses: { step: { tFinal: 400, points: 4001, input: 'load' } },
    });
    const info = out.step.info;
    expect(info.finalValue).toBe(0);
    expect([info.riseTime, info.settlingTime, info.overshootPct]).toEqual([null, null, null]);
    const largest = out.step.y.reduce((a: number, b: number) => (Math.abs(b) > Math.abs(a) ? b : a), 0);
    expect(info.peak).toBeCloseTo(largest, 12);
  });

  it('gives an unstable open path a null final value', async () => {
    const out = await post('analyze', { plant: { num: [1], den: [1, -0.5] }, analyses: { step: { tFinal: 5 }, poles: true } });
    expect(out.step.info.finalValue).toBeNull();
    expect(out.stable).toBe(false);
    expect(out.poles).toEqual([{ re: expect.closeTo(0.5, 12), im: expect.closeTo(0, 12) }]);
  });
});

describe('POST /api/v1/calc/tune', () => {
  const fopdt = { type: 'fopdt', k: 2, tau: 30, theta: 5 };
  const cases = [
    // The contract's table (shared/api-v1.md), formulas as stated there.
    { rule: 'lambda', controller: 'pi', options: { lambda: 20 }, kc: 30 / (2 * 25), ti: 30, td: 0, source: 'contract: lambda' },
    { rule: 'imc', controller: 'pi', options: { lambda: 20 }, kc: 65 / (2 * 2 * 20), ti: 32.5, td: 0, source: 'contract: imc PI' },
    { rule: 'imc', controller: 'pid', options: { lambda: 20 }, kc: 65 / (2 * 45), ti: 32.5, td: (30 * 5) / 65, source: 'contract: imc PID' },
    // Skogestad 2003: kc = τ/(K(τc+θ)), ti = min(τ, 4(τc+θ)); τc = θ by default (from memory).
    { rule: 'simc', controller: 'pi', options: undefined, kc: 30 / (2 * 10), ti: 30, td: 0, source: 'Skogestad 2003' },
    // Ziegler & Nichols 1942 open loop PI: kc = 0.9τ/(Kθ), ti = 10θ/3 (contract states ti).
    { rule: 'zn-open-loop', controller: 'pi', options: undefined, kc: (0.9 * 30) / (2 * 5), ti: 50 / 3, td: 0, source: 'Ziegler & Nichols 1942' },
  ];
  it.each(cases)('$rule $controller answers the formula of $source', async ({ rule, controller, options, kc, ti, td }) => {
    const out = await post('tune', { model: fopdt, rule, controller, ...(options ? { options } : {}) });
    expect(out.controller.form).toBe('ideal');
    relClose(out.controller.kc, kc, 1e-12);
    relClose(out.controller.ti, ti, 1e-12);
    expect(out.controller.td).toBeCloseTo(td, 12);
    expect(out.rule).toBe(rule);
    expect(out.source).toMatch(/\w+/);
  });

  it('answers zn-ultimate PID as kc = 0.6·Ku, ti = Pu/2, td = Pu/8 (Ziegler & Nichols 1942, from memory)', async () => {
    const out = await post('tune', { model: { type: 'ultimate', ku: 5, pu: 40 }, rule: 'zn-ultimate', controller: 'pid' });
    expect(out.controller).toMatchObject({ form: 'ideal', kc: expect.closeTo(3, 12), ti: expect.closeTo(20, 12), td: expect.closeTo(5, 12) });
  });

  it('answers simc PID for an sopdt in series form with td = τ2 (contract table)', async () => {
    const out = await post('tune', { model: { type: 'sopdt', k: 1, tau1: 20, tau2: 4, theta: 2 }, rule: 'simc', controller: 'pid' });
    expect(out.controller.form).toBe('series');
    expect(out.controller.td).toBeCloseTo(4, 12);
  });
});

describe('POST /api/v1/calc/discretize', () => {
  it.each([0.05, 0.1, 1])('gives ZOH of 1/(s+1) at ts = %s as num [1 − e^(−ts)], den [1, −e^(−ts)]', async (ts) => {
    // Zero-order-hold equivalent of a first-order lag (Franklin, Powell & Workman, Digital
    // Control of Dynamic Systems, ch. 6).
    const out = await post('discretize', { tf: { num: [1], den: [1, 1], delay: 3 * ts }, ts, method: 'zoh' });
    const a = Math.exp(-ts);
    expect(out.den).toHaveLength(2);
    expect(out.den[0]).toBe(1);
    expect(out.den[1]).toBeCloseTo(-a, 12);
    expect(out.num[out.num.length - 1]).toBeCloseTo(1 - a, 12);
    expect(out.num.slice(0, -1).every((c: number) => Math.abs(c) < 1e-12)).toBe(true);
    expect(out.delaySamples).toBe(3);
  });

  it('gives Tustin of 1/(s+1) as ts(z+1)/((2+ts)z − (2−ts)), normalized', async () => {
    // Bilinear substitution s = (2/ts)(z−1)/(z+1) (same reference).
    const ts = 0.2;
    const out = await post('discretize', { tf: { num: [1], den: [1, 1] }, ts, method: 'tustin' });
    expect(out.den[0]).toBe(1);
    expect(out.den[1]).toBeCloseTo(-(2 - ts) / (2 + ts), 12);
    expect(out.num).toEqual([expect.closeTo(ts / (2 + ts), 12), expect.closeTo(ts / (2 + ts), 12)]);
    expect(out.delaySamples).toBe(0);
  });
});

describe('POST /api/v1/calc/identify', () => {
  it('recovers K, τ and θ from a noise-free FOPDT step test with a step in u at t = 10 s', async () => {
    // Synthetic record from the FOPDT closed form: y = 50 + K·Δu·(1 − e^(−(t−10−θ)/τ)).
    const [k, tau, theta, du] = [1.5, 12, 4, 10];
    const t = Array.from({ length: 241 }, (_, i) => i * 0.5);
    const u = t.map((ti) => (ti < 10 ? 20 : 20 + du));
    const y = t.map((ti) => (ti < 10 + theta ? 50 : 50 + k * du * (1 - Math.exp(-(ti - 10 - theta) / tau))));
    const out = await post('identify', { t, y, u, model: 'fopdt' });
    expect(out.model.type).toBe('fopdt');
    relClose(out.model.k, k, 0.01);
    relClose(out.model.tau, tau, 0.01);
    relClose(out.model.theta, theta, 0.02);
    expect(out.fit.r2).toBeGreaterThan(0.999);
  });
});
