import { describe, expect, it } from 'vitest';
import { identify } from '../../../src/lib/control/identify';
import type { ProcessModel } from '../../../src/lib/control/types';
import { modelErrorOf } from './helpers';
import { seededGaussian, seededUniform } from './seeded-noise';

/**
 * Step tests generated from the closed-form step responses (e.g. Seborg, Edgar & Mellichamp,
 * Process Dynamics and Control, ch. 5–6):
 *   FOPDT  y = y0 + K·Δu·(1 − e^(−(t−ts−θ)/τ))
 *   SOPDT  y = y0 + K·Δu·(1 − (τ1·e^(−s/τ1) − τ2·e^(−s/τ2))/(τ1 − τ2)),  s = t − ts − θ
 *   IPDT   y = y0 + K·Δu·(t − ts − θ)
 * for t after ts + θ, y0 before, plus seeded Gaussian noise of standard deviation sigma.
 */
function closedForm(model: ProcessModel, s: number): number {
  if (s <= 0) return 0;
  if (model.type === 'fopdt') return 1 - Math.exp(-s / model.tau);
  if (model.type === 'ipdt') return s;
  const { tau1, tau2 } = model;
  return 1 - (tau1 * Math.exp(-s / tau1) - tau2 * Math.exp(-s / tau2)) / (tau1 - tau2);
}

interface Generated {
  t: number[];
  y: number[];
  u: number[];
}

function stepTest(model: ProcessModel, o: { dt: number; n: number; stepAt: number; u0: number; u1: number; y0: number; sigma: number; seed: number }): Generated {
  const noise = seededGaussian(o.seed);
  const t = Array.from({ length: o.n }, (_, i) => i * o.dt);
  // the step instant is the first sample holding the new u
  const u = t.map((ti) => (ti >= o.stepAt ? o.u1 : o.u0));
  const y = t.map((ti) => o.y0 + model.k * (o.u1 - o.u0) * closedForm(model, ti - o.stepAt - model.theta) + o.sigma * noise());
  return { t, y, u };
}

interface Case {
  name: string;
  truth: ProcessModel;
  gen: Parameters<typeof stepTest>[1];
  /** Relative tolerances on k and time constants, absolute (s) on theta. */
  tol: Record<string, number>;
  omitU?: boolean;
}

const cases: Case[] = [
  {
    name: 'HTST holding-tube temperature, FOPDT K=0.42 °C/%, τ=30 s, θ=4 s, y0=71.8 °C, u 40→45 % at t=20 s, σ=0.02 °C',
    truth: { type: 'fopdt', k: 0.42, tau: 30, theta: 4 } as ProcessModel,
    gen: { dt: 0.5, n: 500, stepAt: 20, u0: 40, u1: 45, y0: 71.8, sigma: 0.02, seed: 11 },
    tol: { k: 0.02, tau: 0.04, theta: 0.5 },
  },
  {
    name: 'glycol return temperature, SOPDT K=−0.8, τ1=60 s, τ2=15 s, θ=6 s, y0=3.1 °C, u 30→22 % at t=12 s, σ=0.01',
    truth: { type: 'sopdt', k: -0.8, tau1: 60, tau2: 15, theta: 6 } as ProcessModel,
    gen: { dt: 1, n: 600, stepAt: 12, u0: 30, u1: 22, y0: 3.1, sigma: 0.01, seed: 7 },
    tol: { k: 0.03, tau1: 0.06, tau2: 0.2, theta: 2 },
  },
  {
    name: 'silo level, IPDT K=0.015 %/s per %, θ=8 s, y0=45 %, u 50→55 % at t=30 s, σ=0.05 %',
    truth: { type: 'ipdt', k: 0.015, theta: 8 } as ProcessModel,
    gen: { dt: 1, n: 300, stepAt: 30, u0: 50, u1: 55, y0: 45, sigma: 0.05, seed: 3 },
    tol: { k: 0.02, theta: 1.5 },
  },
  {
    name: 'noise-free FOPDT K=2.5, τ=12 s, θ=1.5 s, unit step at t=0 (no u given)',
    omitU: true,
    truth: { type: 'fopdt', k: 2.5, tau: 12, theta: 1.5 } as ProcessModel,
    gen: { dt: 0.25, n: 400, stepAt: 0, u0: 0, u1: 1, y0: 0, sigma: 0, seed: 1 },
    tol: { k: 1e-4, tau: 1e-4, theta: 1e-3 },
  },
  {
    name: 'noise-free SOPDT K=1.3, τ1=20 s, τ2=5 s, θ=3 s, y0=−2',
    truth: { type: 'sopdt', k: 1.3, tau1: 20, tau2: 5, theta: 3 } as ProcessModel,
    gen: { dt: 0.5, n: 400, stepAt: 5, u0: 10, u1: 12, y0: -2, sigma: 0, seed: 1 },
    tol: { k: 1e-3, tau1: 1e-3, tau2: 1e-2, theta: 0.05 },
  },
];

describe('identify', () => {
  it.each(cases)('recovers $name', ({ truth, gen, tol, omitU }) => {
    const { u, ...data } = stepTest(truth, gen);
    const { model, fit } = identify({ ...data, ...(omitU ? {} : { u }), model: truth.type });
    expect(model.type).toBe(truth.type);
    // relative tolerance on gains and time constants, absolute (s) on dead time
    expect(Math.abs(model.k / truth.k - 1)).toBeLessThan(tol.k);
    if (model.type === 'fopdt' && truth.type === 'fopdt') {
      expect(Math.abs(model.tau / truth.tau - 1)).toBeLessThan(tol.tau);
    }
    if (model.type === 'sopdt' && truth.type === 'sopdt') {
      expect(model.tau1).toBeGreaterThanOrEqual(model.tau2);
      expect(Math.abs(model.tau1 / truth.tau1 - 1)).toBeLessThan(tol.tau1);
      expect(Math.abs(model.tau2 / truth.tau2 - 1)).toBeLessThan(tol.tau2);
    }
    expect(Math.abs(model.theta - truth.theta)).toBeLessThan(tol.theta);
    // the residual is the added noise: rmse near sigma, r2 near 1
    expect(fit.rmse).toBeLessThan(gen.sigma * 1.2 + 1e-4);
    expect(fit.r2).toBeGreaterThan(0.99);
  });

  it('assumes a unit step at t = 0 when u is absent', () => {
    const truth = { type: 'fopdt', k: 3, tau: 8, theta: 2 } as const;
    const t = Array.from({ length: 200 }, (_, i) => i * 0.25);
    const y = t.map((ti) => 5 + 3 * closedForm(truth, ti - 2));
    const { model } = identify({ t, y, model: 'fopdt' });
    expect(model).toMatchObject({ type: 'fopdt' });
    expect(model.k).toBeCloseTo(3, 3);
    expect(model.theta).toBeCloseTo(2, 2);
  });

  it('fits a long record (20 000 samples, thinned for the optimizer) as well as a short one', () => {
    const truth: ProcessModel = { type: 'fopdt', k: 1.8, tau: 45, theta: 9 };
    const data = stepTest(truth, { dt: 0.02, n: 20000, stepAt: 30, u0: 20, u1: 26, y0: 12, sigma: 0.01, seed: 9 });
    const { model, fit } = identify({ ...data, model: 'fopdt' });
    expect(Math.abs(model.k / truth.k - 1)).toBeLessThan(0.01);
    expect(model.type === 'fopdt' && Math.abs(model.tau / 45 - 1)).toBeLessThan(0.02);
    expect(Math.abs(model.theta - 9)).toBeLessThan(0.3);
    expect(fit.rmse).toBeLessThan(0.012);
  });

  it('answers the contract shape: model {type, k, tau, theta} and fit {rmse, r2}, plus warnings', () => {
    const data = stepTest(cases[0].truth, cases[0].gen);
    const result = identify({ ...data, model: 'fopdt' });
    expect(Object.keys(result.model).sort()).toEqual(['k', 'tau', 'theta', 'type']);
    expect(Object.keys(result.fit).sort()).toEqual(['r2', 'rmse']);
    expect(result.warnings).toEqual([]);
  });

  it('warns when the record stops before θ + 3τ (common practice: 95 % of a first-order step)', () => {
    const truth: ProcessModel = { type: 'fopdt', k: 1, tau: 100, theta: 5 };
    const data = stepTest(truth, { dt: 1, n: 120, stepAt: 10, u0: 0, u1: 1, y0: 0, sigma: 0, seed: 1 });
    const { warnings } = identify({ ...data, model: 'fopdt' });
    expect(warnings.some((w) => /record ends/.test(w))).toBe(true);
  });

  it('warns about a poor match when an integrating model is fitted to a self-regulating response', () => {
    const data = stepTest(cases[3].truth, cases[3].gen);
    const { warnings, fit } = identify({ t: data.t, y: data.y, model: 'ipdt' });
    expect(fit.r2).toBeLessThan(0.9);
    expect(warnings.some((w) => /matches the record poorly/.test(w))).toBe(true);
  });

  const t = Array.from({ length: 20 }, (_, i) => i);
  const y = t.map((v) => (v > 5 ? 1 : 0));
  const bad = [
    { why: 'fewer than 10 samples', request: { t: t.slice(0, 9), y: y.slice(0, 9), model: 'fopdt' }, field: 't' },
    { why: 'times that go backwards', request: { t: [...t.slice(0, 10), 3, ...t.slice(11)], y, model: 'fopdt' }, field: 't.10' },
    { why: 'repeated times', request: { t: [0, ...t.slice(0, 19)], y, model: 'fopdt' }, field: 't.1' },
    { why: 'a NaN in y', request: { t, y: [...y.slice(0, 4), Number.NaN, ...y.slice(5)], model: 'fopdt' }, field: 'y.4' },
    { why: 'y shorter than t', request: { t, y: y.slice(1), model: 'fopdt' }, field: 'y' },
    { why: 'u shorter than t', request: { t, y, u: y.slice(1), model: 'fopdt' }, field: 'u' },
    { why: 'u without a step', request: { t, y, u: t.map(() => 50), model: 'fopdt' }, field: 'u' },
    { why: 'u with two steps', request: { t, y, u: t.map((v) => (v > 5 && v < 12 ? 60 : v >= 12 ? 55 : 50)), model: 'fopdt' }, field: 'u.6' },
    { why: 'a y that never changes', request: { t, y: t.map(() => 20), model: 'ipdt' }, field: 'y' },
    { why: 'no samples after the assumed step at t = 0', request: { t: t.map((v) => v - 100), y, model: 'fopdt' }, field: 't' },
    { why: 'an unknown model', request: { t, y, model: 'fopdt2' }, field: 'model' },
  ];
  it.each(bad)('refuses $why with invalid_request naming the field', ({ request, field }) => {
    const error = modelErrorOf(() => identify(request));
    expect(error.code).toBe('invalid_request');
    expect(error.field).toBe(field);
  });
});

describe('identify over a seeded sweep', () => {
  // Parameters drawn once from seededUniform(2026); 1 % noise of the response range; the step
  // at a random instant in the first 10 % of the record; y0 = 50.
  const sweep = Array.from({ length: 9 }, (_, i) => {
    const r = seededUniform(2026 + i);
    const type = (['fopdt', 'sopdt', 'ipdt'] as const)[i % 3];
    const k = (r() < 0.5 ? -1 : 1) * (0.1 + 5 * r());
    const tau1 = 1 + 100 * r();
    const tau2 = tau1 * (0.05 + 0.6 * r());
    const theta = i % 4 === 0 ? 0 : tau1 * 1.5 * r();
    const truth: ProcessModel =
      type === 'fopdt' ? { type, k, tau: tau1, theta } : type === 'sopdt' ? { type, k, tau1, tau2, theta } : { type, k, theta };
    const horizon = type === 'ipdt' ? theta + tau1 : theta + 6 * (tau1 + tau2);
    const n = 200 + Math.floor(600 * r());
    const stepAt = horizon * 0.1 * r();
    return { i, type, truth, horizon, n, stepAt };
  });

  it.each(sweep)('fits case $i ($type) with r² > 0.99 and k within 3 %', ({ i, truth, horizon, n, stepAt }) => {
    const dt = horizon / n;
    const t = Array.from({ length: n }, (_, j) => j * dt);
    const clean = t.map((ti) => 50 + truth.k * 5 * closedForm(truth, ti - stepAt - truth.theta));
    const range = Math.max(...clean) - Math.min(...clean);
    const noise = seededGaussian(500 + i);
    const y = clean.map((v) => v + 0.01 * range * noise());
    const u = t.map((ti) => (ti >= stepAt ? 45 : 40));
    const { model, fit } = identify({ t, y, u, model: truth.type });
    expect(fit.r2).toBeGreaterThan(0.99);
    expect(Math.abs(model.k / truth.k - 1)).toBeLessThan(0.03);
    const tauScale = truth.type === 'ipdt' ? horizon : truth.type === 'fopdt' ? truth.tau : truth.tau1;
    expect(Math.abs(model.theta - truth.theta)).toBeLessThan(0.05 * (tauScale + truth.theta));
  });
});
