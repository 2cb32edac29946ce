import { describe, expect, it } from 'vitest';
import { impulseResponse, rampResponse, simulateInput, stepResponse } from '../../../src/lib/control/simulate';
import { timeGrid } from '../../../src/lib/control/time-grid';
import fixtures from '../../reference/fixtures/time-responses.json';

function maxAbsDiff(a: number[], b: number[]): number {
  return Math.max(...a.map((v, i) => Math.abs(v - b[i])));
}

describe('stepResponse', () => {
  // Source: tests/reference/fixtures/time-responses.json (scipy.signal.step, dead time by shifting).
  for (const c of fixtures.cases) {
    it(`matches scipy.signal.step for ${c.name} (abs tol 1e-8 of the peak)`, () => {
      const r = stepResponse(c.tf, c.t);
      const scale = Math.max(...c.step.map(Math.abs));
      expect(maxAbsDiff(r.y, c.step)).toBeLessThan(1e-8 * scale);
    });
  }

  it('equals the FOPDT closed form K(1 − e^(−(t−θ)/τ)) after the dead time (handbook closed form, rel 1e-11)', () => {
    const rows = [
      { k: 2.5, tau: 30, theta: 4, tFinal: 200 },
      { k: -0.8, tau: 0.5, theta: 0.37, tFinal: 5 },
      { k: 1, tau: 1e4, theta: 0, tFinal: 5e4 },
    ];
    for (const { k, tau, theta, tFinal } of rows) {
      const t = timeGrid(tFinal, 301);
      const r = stepResponse({ num: [k], den: [tau, 1], delay: theta }, t);
      t.forEach((tk, i) => {
        const expected = tk < theta ? 0 : k * (1 - Math.exp(-(tk - theta) / tau));
        expect(Math.abs(r.y[i] - expected)).toBeLessThan(1e-11 * Math.abs(k));
      });
    }
  });

  it('starts at the direct feedthrough for a biproper system (D = b0/a0)', () => {
    const r = stepResponse({ num: [2, 1], den: [1, 1], delay: 0 }, timeGrid(5, 51));
    expect(r.y[0]).toBeCloseTo(2, 14);
    // Closed form 1 + e^(−t) for (2s+1)/(s+1).
    r.t.forEach((tk, i) => expect(r.y[i]).toBeCloseTo(1 + Math.exp(-tk), 12));
  });
});

describe('impulseResponse', () => {
  for (const c of fixtures.cases.filter((x) => x.tf.num.length < x.tf.den.length)) {
    it(`matches scipy.signal.impulse for ${c.name} (abs tol 1e-8 of the peak)`, () => {
      const r = impulseResponse(c.tf, c.t);
      const scale = Math.max(...c.impulse.map(Math.abs));
      expect(maxAbsDiff(r.y, c.impulse)).toBeLessThan(1e-8 * scale);
    });
  }
});

describe('rampResponse', () => {
  it('follows t − τ(1 − e^(−t/τ)) for 1/(τs + 1) (closed form, abs 1e-10)', () => {
    const t = timeGrid(20, 201);
    const r = rampResponse({ num: [1], den: [3, 1], delay: 0 }, t);
    t.forEach((tk, i) => expect(Math.abs(r.y[i] - (tk - 3 * (1 - Math.exp(-tk / 3))))).toBeLessThan(1e-10));
  });
});

describe('simulateInput', () => {
  // Source: scipy.signal.lsim with linear interpolation between samples.
  for (const c of fixtures.lsim) {
    it(`matches scipy.signal.lsim for ${c.name} (abs tol 1e-9)`, () => {
      const r = simulateInput(c.tf, c.t, c.u);
      expect(maxAbsDiff(r.y, c.y)).toBeLessThan(1e-9);
    });
  }

  it('delays the response of a sampled input by the dead time exactly when it is whole samples', () => {
    const t = timeGrid(40, 401);
    const u = t.map((x) => Math.sin(0.3 * x));
    const plain = simulateInput({ num: [1], den: [4, 1], delay: 0 }, t, u).y;
    const late = simulateInput({ num: [1], den: [4, 1], delay: 2.5 }, t, u).y;
    for (let i = 25; i < t.length; i++) expect(late[i]).toBeCloseTo(plain[i - 25], 12);
    for (let i = 0; i < 25; i++) expect(late[i]).toBe(0);
  });

  it('refuses an input of the wrong length and a grid that is not evenly spaced', () => {
    expect(() => simulateInput({ num: [1], den: [1, 1], delay: 0 }, [0, 1, 2], [1, 1])).toThrow(/one value per time sample/);
    expect(() => simulateInput({ num: [1], den: [1, 1], delay: 0 }, [0, 1, 3], [1, 1, 1])).toThrow(/evenly spaced/);
  });
});
