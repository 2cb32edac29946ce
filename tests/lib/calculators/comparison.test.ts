import { describe, expect, it } from 'vitest';
import { compareWithResponses, sharedHorizon } from '../../../src/lib/calculators/comparison';

describe('compareWithResponses', () => {
  // FOPDT K = 1, τ = 10 s, θ = 2 s: SIMC PI with τc = θ gives Kc = τ/(K(τc + θ)) = 2.5 and
  // Ti = min(τ, 4(τc + θ)) = 10 s (Skogestad 2003, J. Process Control 13, eq. 20).
  const result = compareWithResponses({ model: { type: 'fopdt', k: 1, tau: 10, theta: 2 }, controller: 'pi' });

  it('tunes SIMC as Skogestad 2003 gives it and overlays its response on the shared grid', () => {
    const simc = result.rows.find((r) => r.rule === 'simc')!;
    expect(simc.controller.kc).toBeCloseTo(2.5, 10);
    expect(simc.controller.ti).toBeCloseTo(10, 10);
    expect(simc.y).toHaveLength(result.t.length);
    expect(result.t.at(-1)).toBeCloseTo(result.tFinal, 9);
  });

  it('gives every stable rule a response that settles at the setpoint (integral action)', () => {
    for (const row of result.rows.filter((r) => r.predicted.stable)) {
      expect(row.y!.at(-1)).toBeCloseTo(1, 1);
    }
    expect(result.rows.length).toBeGreaterThanOrEqual(5);
  });
});

describe('sharedHorizon', () => {
  it('is 1.5 times the slowest settling time, or the fallback when none settles', () => {
    const row = (settlingTime: number | null) => ({ predicted: { settlingTime } }) as never;
    expect(sharedHorizon([row(40), row(90), row(null)], 100)).toBe(135);
    expect(sharedHorizon([row(null)], 100)).toBe(100);
  });
});
