import { describe, expect, it } from 'vitest';
import { analyzeLoop } from '../../../src/lib/calculators/loop';

describe('analyzeLoop', () => {
  /**
   * K/(τs + 1) under P control: Y/R = K·kc/(τs + 1 + K·kc), a first-order lag with final value
   * K·kc/(1 + K·kc) and time constant τ/(1 + K·kc), so its 10–90 % rise time is τcl·ln 9;
   * Y/D = K/(τs + 1 + K·kc) settles at K/(1 + K·kc). Ogata, Modern Control Engineering, §5-3.
   */
  it('matches the closed form of a first-order plant under proportional control', () => {
    const K = 2, tau = 30, kc = 1.5;
    const r = analyzeLoop({ model: { type: 'fopdt', k: K, tau, theta: 0 }, controller: { form: 'ideal', kc } });
    const tauCl = tau / (1 + K * kc);
    expect(r.setpoint.info.finalValue).toBeCloseTo((K * kc) / (1 + K * kc), 9);
    expect(r.setpoint.info.riseTime).toBeCloseTo(tauCl * Math.log(9), 1);
    expect(r.load.info.finalValue).toBeCloseTo(K / (1 + K * kc), 9);
    expect(r.stable).toBe(true);
    expect(r.load.t).toEqual(r.setpoint.t);
  });

  /**
   * With integral action the integrated error of a unit load step at the process input is
   * IE = Ti/Kc whatever the process (Åström & Hägglund, Advanced PID Control, 2006, §4.4 —
   * section from memory); a lambda-tuned loop does not overshoot, so IAE = IE.
   * Lambda tuning of K = 1, τ = 10 s, θ = 2 s with λ = τ: Kc = τ/(K(λ + θ)) = 10/12, Ti = τ.
   */
  it('gives IAE = Ti/Kc for the load step of a lambda-tuned loop', () => {
    const kc = 10 / 12, ti = 10;
    const r = analyzeLoop({ model: { type: 'fopdt', k: 1, tau: 10, theta: 2 }, controller: { form: 'ideal', kc, ti }, tFinal: 300, points: 3001 });
    expect(r.load.info.finalValue).toBe(0);
    expect(r.load.iae).toBeCloseTo(ti / kc, 1);
    expect(r.figures.load.iae).toBe(r.load.iae);
  });

  it('reports an integrating level loop under PI and refuses to give Ms to an unstable one', () => {
    const level = { type: 'ipdt' as const, k: 0.01, theta: 4 };
    const ok = analyzeLoop({ model: level, controller: { form: 'ideal', kc: 8, ti: 200 } });
    expect(ok.stable).toBe(true);
    expect(ok.setpoint.info.finalValue).toBeCloseTo(1, 9);
    const bad = analyzeLoop({ model: level, controller: { form: 'ideal', kc: 80, ti: 20 }, tFinal: 200 });
    expect(bad.stable).toBe(false);
    expect(bad.figures.ms).toBeNull();
    expect(bad.setpoint.info.settlingTime).toBeNull();
  });

  it('takes a transfer-function model and a sensor lag', () => {
    const r = analyzeLoop({
      model: { type: 'tf', num: [0.5], den: [20, 12, 1], delay: 3 },
      controller: { form: 'series', kc: 2, ti: 15, td: 2, n: 10 },
      sensor: { num: [1], den: [2, 1] },
    });
    expect(r.stable).toBe(true);
    expect(r.setpoint.info.finalValue).toBeCloseTo(1, 9);
    expect(r.margins.phaseMarginDeg).not.toBeNull();
  });
});
