import { describe, expect, it } from 'vitest';
import { tune, type TuneRequest } from '../../../src/lib/control/tuning';
import { readRecipeFiles } from '../../../src/lib/recipes/file-reader';

const SIMC = 'Skogestad (2003), Simple analytic rules for model reduction and PID controller tuning, J. Process Control 13';
const LAMBDA = 'Lambda tuning, kc = τ/(K(λ+θ)), ti = τ (Rivera, Morari & Skogestad 1986; the contract\'s table)';

/**
 * Each recipe's controller against the published rule it names, applied by the engine to the
 * model the recipe says it tuned on (its own, or the half-rule reduction it states). Stated
 * numbers are rounded to two or three figures: 2 % tolerance. Field-tuned recipes are not listed.
 */
const rows: { slug: string; request: TuneRequest; compare: ('kc' | 'ti' | 'td')[]; inner?: boolean; tiFactor?: number; source: string }[] = [
  { slug: 'raw-milk-reception-flow', request: { model: { type: 'fopdt', k: 0.45, tau: 2.5, theta: 0.6 }, rule: 'lambda', controller: 'pi', options: { lambda: 3 } }, compare: ['kc', 'ti'], source: LAMBDA },
  { slug: 'cip-caustic-dosing-ratio', request: { model: { type: 'fopdt', k: 0.12, tau: 1.5, theta: 0.4 }, rule: 'lambda', controller: 'pi', options: { lambda: 1.6 } }, compare: ['kc', 'ti'], source: LAMBDA },
  { slug: 'cip-return-temperature-dead-time', request: { model: { type: 'fopdt', k: 0.8, tau: 60, theta: 75 }, rule: 'simc', controller: 'pi', options: { tauC: 75 } }, compare: ['kc', 'ti'], source: SIMC },
  { slug: 'boiler-steam-header-pressure', request: { model: { type: 'fopdt', k: 0.05, tau: 60, theta: 8 }, rule: 'simc', controller: 'pi', options: { tauC: 16 } }, compare: ['kc', 'ti'], source: SIMC },
  { slug: 'filler-infeed-conveyor-speed', request: { model: { type: 'fopdt', k: 1, tau: 0.4, theta: 0.05 }, rule: 'simc', controller: 'pi', options: { tauC: 0.15 } }, compare: ['kc', 'ti'], source: SIMC },
  { slug: 'wastewater-ph-neutralisation', request: { model: { type: 'fopdt', k: 0.08, tau: 120, theta: 30 }, rule: 'simc', controller: 'pi', options: { tauC: 90 } }, compare: ['kc', 'ti'], source: SIMC },
  { slug: 'htst-product-temperature-cascade', request: { model: { type: 'fopdt', k: 0.7, tau: 15, theta: 2 }, rule: 'simc', controller: 'pi', options: { tauC: 4 } }, compare: ['kc', 'ti'], inner: true, source: SIMC },
  // Outer loop: SIMC on the half-rule reduction of 0.9e^(−5s)/((20s+1)(4s+1)): τ = 22 s, θ = 7 s (Skogestad 2003, §2).
  { slug: 'htst-product-temperature-cascade', request: { model: { type: 'fopdt', k: 0.9, tau: 22, theta: 7 }, rule: 'simc', controller: 'pi', options: { tauC: 10.5 } }, compare: ['kc', 'ti'], source: SIMC },
  // Whole chain reduced by the half rule: τ = 40 + 1.5 s, θ = 6 + 1.5 + 8 s.
  { slug: 'glycol-supply-temperature-block-chain', request: { model: { type: 'fopdt', k: -0.3, tau: 41.5, theta: 15.5 }, rule: 'simc', controller: 'pi', options: { tauC: 15.5 } }, compare: ['kc', 'ti'], source: SIMC },
  // Inverse response (12 s) and lag (5 s) taken as effective dead time, as the recipe states.
  { slug: 'boiler-drum-level-inverse-response', request: { model: { type: 'ipdt', k: 0.004, theta: 17 }, rule: 'simc', controller: 'pi', options: { tauC: 45 } }, compare: ['kc', 'ti'], source: SIMC },
  // The recipe doubles SIMC's integral time on purpose.
  { slug: 'packaging-film-dancer-position', request: { model: { type: 'ipdt', k: 0.5, theta: 0.1 }, rule: 'simc', controller: 'pi', options: { tauC: 0.3 } }, compare: ['kc', 'ti'], tiFactor: 2, source: SIMC },
  { slug: 'raw-milk-silo-temperature-pid', request: { model: { type: 'sopdt', k: -0.05, tau1: 1800, tau2: 300, theta: 120 }, rule: 'simc', controller: 'pid', options: { tauC: 360 } }, compare: ['kc', 'ti', 'td'], source: SIMC },
];

const recipes = new Map(readRecipeFiles().map((r) => [r.slug, r.data]));

describe('tuning of the file recipes against the rule each one names', () => {
  it.each(rows.map((r) => [`${r.slug}${r.inner ? ' (inner loop)' : ''}`, r] as const))('%s', (_name, row) => {
    const recipe = recipes.get(row.slug);
    expect(recipe, `${row.slug} exists`).toBeDefined();
    const stated = row.inner ? recipe!.innerLoop!.controller : recipe!.controller;
    expect(stated.form).not.toBe('parallel');
    if (stated.form === 'parallel') return;
    const { controller: tuned } = tune(row.request);
    expect(stated.form, `${row.slug}: form (${row.source})`).toBe(tuned.form);
    const expected = { kc: tuned.kc, ti: tuned.ti * (row.tiFactor ?? 1), td: tuned.td };
    for (const key of row.compare) {
      const value = stated[key] ?? 0;
      expect(Math.abs(value - expected[key]), `${row.slug}: ${key} ${value} vs ${expected[key].toPrecision(4)} (${row.source})`).toBeLessThanOrEqual(0.02 * Math.abs(expected[key]));
    }
  });
});
