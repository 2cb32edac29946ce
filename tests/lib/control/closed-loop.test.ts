import { describe, expect, it } from 'vitest';
import { closedLoopImpulse, closedLoopResponse, closedLoopStep } from '../../../src/lib/control/closed-loop';
import { timeGrid } from '../../../src/lib/control/time-grid';
import fixtures from '../../reference/fixtures/closed-loops.json';

const unity = { num: [1], den: [1], delay: 0 };

describe('closedLoopStep', () => {
  // Source: tests/reference/fixtures/closed-loops.json — method-of-steps DDE integration with
  // scipy solve_ivp (RK45, rtol 1e-10). Tolerance 1e-5 of the response's largest magnitude (fourth-order scheme, default steps).
  for (const c of fixtures.cases) {
    it(`matches the method-of-steps reference for ${c.name}`, () => {
      const r = closedLoopStep({ controller: c.controller, plant: c.plant, sensor: c.sensor }, c.t, c.input as 'setpoint' | 'load');
      const scale = Math.max(...c.y.map(Math.abs));
      const err = Math.max(...r.y.map((v, i) => Math.abs(v - c.y[i])));
      expect(err).toBeLessThan(1e-5 * scale);
    });
  }

  it('converges at fourth order in the step (grid independence): halving the step divides the error by about 16', () => {
    const c = fixtures.cases[3];
    const loop = { controller: c.controller, plant: c.plant, sensor: c.sensor };
    const err = (minSteps: number) => {
      const r = closedLoopStep(loop, c.t, 'setpoint', { minSteps });
      return Math.max(...r.y.map((v, i) => Math.abs(v - c.y[i])));
    };
    const e1 = err(250), e2 = err(500);
    expect(e1 / e2).toBeGreaterThan(8);
  });

  it('is rational and exact without dead time: P control of 1/(s+1) settles at K/(1+K) (closed form)', () => {
    const t = timeGrid(10, 101);
    const r = closedLoopStep({ controller: { num: [3], den: [1], delay: 0 }, plant: { num: [1], den: [1, 1], delay: 0 }, sensor: unity }, t);
    // Y/R = 3/(s + 4): y = 0.75(1 − e^(−4t)).
    t.forEach((tk, i) => expect(r.y[i]).toBeCloseTo(0.75 * (1 - Math.exp(-4 * tk)), 12));
  });

  it('handles a dead time shorter than one step (solved within the step)', () => {
    const t = timeGrid(60, 61);
    const loop = (delay: number) => ({ controller: { num: [5, 0.5], den: [10, 0], delay: 0 }, plant: { num: [1], den: [10, 1], delay }, sensor: unity });
    const fine = closedLoopStep(loop(0.01), t, 'setpoint', { minSteps: 60 });
    const none = closedLoopStep(loop(0), t);
    // A 0.01 s dead time barely changes a loop whose time constant is 10 s (common practice).
    fine.y.forEach((v, i) => expect(Math.abs(v - none.y[i])).toBeLessThan(2e-3));
  });

  it('takes a static sensor gain k exactly: y with H = k equals (y with plant k·G and H = 1)/k (block-diagram algebra)', () => {
    const c = fixtures.cases[3];
    const plant = { ...c.plant, delay: c.plant.delay + 0.7 };
    const k = 1.7;
    const withGain = closedLoopStep({ controller: c.controller, plant, sensor: { num: [k], den: [1], delay: 0 } }, c.t);
    const scaled = closedLoopStep({ controller: c.controller, plant: { ...plant, num: plant.num.map((v) => k * v) }, sensor: unity }, c.t);
    const scale = Math.max(...scaled.y.map(Math.abs));
    withGain.y.forEach((v, i) => expect(Math.abs(v - scaled.y[i] / k)).toBeLessThan(1e-9 * scale));
  });

  it('refuses an unfiltered derivative on a plant without lag when the loop has dead time', () => {
    const t = timeGrid(10, 11);
    expect(() => closedLoopStep({ controller: { num: [1, 1], den: [1], delay: 0 }, plant: { num: [1], den: [1], delay: 1 }, sensor: unity }, t)).toThrow(/derivative filter/);
  });
});

describe('closedLoopResponse', () => {
  // The silo-flow loop of the fixtures: FOPDT 1/(10s+1)·e^(−2s) under PI 0.5(1 + 1/(10s)).
  const c = fixtures.cases[0];
  const loop = { controller: c.controller, plant: c.plant, sensor: c.sensor };
  const t = timeGrid(60, 601);

  it('gives the ramp response as the running integral of the step response (linearity), abs 1e-5', () => {
    const step = closedLoopResponse(loop, t, { setpoint: 'step' }).y;
    const ramp = closedLoopResponse(loop, t, { setpoint: 'ramp' }).y;
    let integral = 0;
    for (let k = 1; k < t.length; k++) {
      integral += ((step[k - 1] + step[k]) / 2) * (t[k] - t[k - 1]);
      expect(Math.abs(ramp[k] - integral)).toBeLessThan(1e-5 * Math.max(1, integral));
    }
  });

  it('gives the impulse response as the rate of the step response (closed form 3e^(−4t) without dead time)', () => {
    const p = { controller: { num: [3], den: [1], delay: 0 }, plant: { num: [1], den: [1, 1], delay: 0 }, sensor: unity };
    const imp = closedLoopImpulse(p, t);
    t.forEach((tk, i) => expect(imp.y[i]).toBeCloseTo(3 * Math.exp(-4 * tk), 10));
    const withDelay = closedLoopImpulse(loop, t).y;
    const step = closedLoopStep(loop, t).y;
    for (let k = 30; k < t.length - 1; k++) expect(Math.abs(withDelay[k] - (step[k + 1] - step[k - 1]) / 0.2)).toBeLessThan(1e-3);
  });

  it('treats a sampled setpoint of ones as the step, and superposes setpoint and load', () => {
    const sampled = closedLoopResponse(loop, t, { setpoint: { samples: t.map(() => 1) } }).y;
    const step = closedLoopStep(loop, t).y;
    sampled.forEach((v, i) => expect(v).toBeCloseTo(step[i], 9));
    const both = closedLoopResponse(loop, t, { setpoint: 'step', load: 'step' }).y;
    const load = closedLoopStep(loop, t, 'load').y;
    both.forEach((v, i) => expect(v).toBeCloseTo(step[i] + load[i], 9));
  });

  it('treats a sampled load of t as the ramp load (rates from the input slopes: rel 1e-6)', () => {
    const a = closedLoopResponse(loop, t, { load: { samples: t } }).y;
    const b = closedLoopResponse(loop, t, { load: 'ramp' }).y;
    a.forEach((v, i) => expect(Math.abs(v - b[i])).toBeLessThan(1e-6 * Math.max(1, Math.abs(b[i]))));
  });
});
