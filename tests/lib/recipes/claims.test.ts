import { describe, expect, it } from 'vitest';
import { readRecipeFiles } from '../../../src/lib/recipes/file-reader';
import { brokenClaims, recipeClaimReports } from '../../../src/lib/recipes/engine-claims';
import { makeRecord } from './make-record';

const files = readRecipeFiles();

describe('claims of every file recipe', () => {
  it('reads at least 14 recipes', () => {
    expect(files.length).toBeGreaterThanOrEqual(14);
  });

  it.each(files.map((r) => [r.slug, r] as const))('%s: every claim holds when the engine recomputes it', (_slug, record) => {
    expect(brokenClaims(record.data.title, record.data)).toEqual([]);
    const reports = recipeClaimReports(record.data);
    expect(reports.every((r) => r.stable)).toBe(true);
    expect(reports.flatMap((r) => r.results).length).toBeGreaterThan(0);
  });
});

describe('brokenClaims', () => {
  // Lambda-tuned PI on K e^(−0.6 s)/(2.5 s + 1): λ = 3 s gives kc = 2.5/(0.45·3.6), ti = τ, an
  // overdamped loop (lambda tuning's design intent; Rivera, Morari & Skogestad 1986, IMC-PID).
  it('names the recipe and the claim when a claim does not hold', () => {
    const record = makeRecord('broken', {
      title: 'Deliberately broken flow loop',
      claims: [
        { metric: 'overshootPct', op: '<=', value: 2 },
        { metric: 'settlingTime', op: '<=', value: 1 },
      ],
    });
    const failures = brokenClaims(record.data.title, record.data);
    expect(failures).toHaveLength(1);
    expect(failures[0]).toContain('Deliberately broken flow loop');
    expect(failures[0]).toContain('Settling time (2 %) ≤ 1 s (setpoint step)');
  });

  it('fails every claim of a loop that is unstable', () => {
    // Common practice: a PI with kc far above the ultimate gain of an FOPDT loop oscillates
    // with growing amplitude (ultimate gain here ≈ 9.4 × 1.54 from the gain margin).
    const record = makeRecord('unstable', { controller: { form: 'ideal', kc: 30, ti: 2.5 }, claims: [{ metric: 'ms', op: '<=', value: 100 }] });
    const failures = brokenClaims('Unstable', record.data);
    expect(failures.some((f) => f.includes('unstable'))).toBe(true);
  });

  it('checks the inner loop of a cascade as well', () => {
    const inner = { loopTag: 'TIC-901', role: 'hot water', units: { pv: '°C', mv: '%' }, model: { type: 'fopdt' as const, k: 0.7, tau: 15, theta: 2 }, controller: { form: 'ideal' as const, kc: 3.57, ti: 15 }, claims: [{ metric: 'phaseMarginDeg' as const, op: '>=' as const, value: 89 }] };
    const record = makeRecord('cascade', { structure: 'cascade', innerLoop: inner });
    const failures = brokenClaims('Cascade', record.data);
    expect(failures).toHaveLength(1);
    expect(failures[0]).toContain('inner loop claim "Phase margin ≥ 89°"');
  });
});
