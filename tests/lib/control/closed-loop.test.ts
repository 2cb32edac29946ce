import { describe, expect, it } from 'vitest';
import { closedLoopStep } from '../../../src/lib/control/closed-loop';
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

  it('refuses an unfiltered derivative on a plant without lag when the loop has dead time', () => {
    const t = timeGrid(10, 11);
    expect(() => closedLoopStep({ controller: { num: [1, 1], den: [1], delay: 0 }, plant: { num: [1], den: [1], delay: 1 }, sensor: unity }, t)).toThrow(/derivative filter/);
  });
});
