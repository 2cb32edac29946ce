import { describe, expect, it } from 'vitest';
import { matchRecipes, modelDistance, reduce } from '../../../src/lib/fielddata/match';
import { loopTypeOfTag } from '../../../src/lib/fielddata/loop-type';
import type { ProcessModel } from '../../../src/lib/control/types';

describe('reduce', () => {
  // Skogestad (2003), "Simple analytic rules for model reduction and PID controller tuning",
  // J. Process Control 13:291–309, half rule: the smaller lag τ2 is split half to τ1, half to θ.
  // 1/((s+1)(0.2s+1)) → e^(−0.1s)/(1.1s+1) is the rule applied by hand (from memory of the paper's examples).
  it('applies the half rule to a second-order model', () => {
    const r = reduce({ type: 'sopdt', k: 1, tau1: 1, tau2: 0.2, theta: 0 });
    expect(r).toEqual({ integrating: false, k: 1, tau: 1.1, theta: 0.1 });
  });
});

const fopdt = (k: number, tau: number, theta: number): ProcessModel => ({ type: 'fopdt', k, tau, theta });

describe('modelDistance', () => {
  // The distance is defined in src/lib/fielddata/match.ts; each row is worked by hand from it.
  const rows: { name: string; a: ProcessModel; b: ProcessModel; total: number }[] = [
    { name: 'the same model is at distance 0', a: fopdt(0.4, 30, 4), b: fopdt(0.4, 30, 4), total: 0 },
    { name: 'a gain e times larger counts 1', a: fopdt(1, 30, 3), b: fopdt(Math.E, 30, 3), total: 1 },
    { name: 'a time constant e² times larger at the same θ/τ counts 2', a: fopdt(1, 10, 1), b: fopdt(1, 10 * Math.E ** 2, Math.E ** 2), total: 2 },
    { name: 'θ/τ 0.1 against 0.6 counts 2·0.5 = 1', a: fopdt(1, 10, 1), b: fopdt(1, 10, 6), total: 1 },
    { name: 'opposite gain signs add 3', a: fopdt(-2, 10, 1), b: fopdt(2, 10, 1), total: 3 },
    { name: 'two integrators: slope ratio 2 and θ ratio 2', a: { type: 'ipdt', k: 0.01, theta: 5 }, b: { type: 'ipdt', k: 0.02, theta: 10 }, total: 2 * Math.log(2) },
    { name: 'an integrator against a lag of slope k/τ, same θ, adds 1 for the class', a: { type: 'ipdt', k: 0.01, theta: 5 }, b: fopdt(2, 200, 5), total: 1 },
  ];
  for (const row of rows) {
    it(row.name, () => {
      expect(modelDistance(row.a, row.b).total).toBeCloseTo(row.total, 12);
      expect(modelDistance(row.b, row.a).total).toBeCloseTo(row.total, 12);
    });
  }
});

describe('matchRecipes', () => {
  const recipes = [
    { slug: 'htst-hot-water', title: 'HTST hot water', loopType: 'temperature', model: fopdt(0.5, 40, 5) },
    { slug: 'silo-level', title: 'Silo level', loopType: 'level', model: { type: 'ipdt', k: 0.002, theta: 2 } },
    { slug: 'cip-supply-temp', title: 'CIP supply temperature', loopType: 'temperature', model: fopdt(1.5, 120, 20) },
    { slug: 'boiler-pressure', title: 'Boiler pressure', loopType: 'pressure', model: fopdt(0.42, 30, 4) },
    { slug: 'custom-tf', title: 'A general transfer function', loopType: 'temperature', model: { type: 'tf', num: [1], den: [1, 1] } },
    { slug: 'no-model', title: 'No model', loopType: 'temperature', model: null },
  ];

  it('lists the same loop type first, nearest first, and skips recipes without a low-order model', () => {
    const m = matchRecipes(fopdt(0.42, 30, 4), 'temperature', recipes);
    expect(m.map((r) => r.slug)).toEqual(['htst-hot-water', 'cip-supply-temp', 'boiler-pressure', 'silo-level']);
    expect(m[0].sameLoopType).toBe(true);
    expect(m[2]).toMatchObject({ sameLoopType: false, distance: 0 });
  });

  it('keeps at most the requested number', () => {
    expect(matchRecipes(fopdt(0.42, 30, 4), 'level', recipes, 2).map((r) => r.slug)).toEqual(['silo-level', 'boiler-pressure']);
  });
});

describe('loopTypeOfTag', () => {
  // ISA-5.1 first letters (measured variable): common practice.
  it.each([['TIC-210', 'temperature'], ['FIC-101', 'flow'], ['LIC-301', 'level'], ['PIC-501', 'pressure'], ['AIC-710', 'ph'], ['XY-10', 'other']])(
    '%s is a %s loop',
    (tag, type) => expect(loopTypeOfTag(tag)).toBe(type),
  );
});
