import { describe, expect, it } from 'vitest';
import { frequencyView, gridAround, logGrid, msCircle } from '../../../src/lib/calculators/frequency-view';

describe('logGrid', () => {
  it('spaces frequencies evenly in log ω from end to end', () => {
    const w = logGrid(0.01, 10, 4);
    expect(w).toHaveLength(4);
    [0.01, 0.1, 1, 10].forEach((x, i) => expect(w[i]).toBeCloseTo(x, 12));
  });
});

describe('gridAround', () => {
  it('spans two decades below the lowest crossover to one above the highest, null without any', () => {
    expect(gridAround({ gainCrossover: 0.05, phaseCrossover: 0.2 })).toEqual({ lo: 0.0005, hi: 2 });
    expect(gridAround({ gainCrossover: null, phaseCrossover: null })).toBeNull();
  });
});

describe('msCircle', () => {
  it('lies at distance 1/Ms from −1 (the definition of the sensitivity circle)', () => {
    const c = msCircle(1.6);
    c.re.forEach((x, i) => expect(Math.hypot(x + 1, c.im[i]!)).toBeCloseTo(1 / 1.6, 12));
    expect(msCircle(Number.POSITIVE_INFINITY).re).toEqual([]);
  });
});

/**
 * Reference: an integrator with dead time L = (k/s)·e^(−θs) under a P controller of gain kc has
 * |L| = kc·k/ω, so ωgc = kc·k, phase −90° − ωθ·180/π; phase margin 90° − kc·k·θ·180/π, phase
 * crossover π/(2θ), gain margin π/(2·kc·k·θ). Closed forms, e.g. Åström & Murray, "Feedback
 * Systems" (2008), §10.3 (section from memory).
 */
describe('frequencyView', () => {
  it('gives the closed-form margins of K·e^(−θs)/s under P control, and a Nyquist curve consistent with them', () => {
    const k = 0.02, theta = 5, kc = 4;
    const r = frequencyView({ model: { type: 'ipdt', k, theta }, controller: { form: 'ideal', kc } });
    const wgc = kc * k;
    expect(r.margins.gainCrossover).toBeCloseTo(wgc, 6);
    expect(r.margins.phaseMarginDeg).toBeCloseTo(90 - (wgc * theta * 180) / Math.PI, 4);
    expect(r.margins.phaseCrossover).toBeCloseTo(Math.PI / (2 * theta), 6);
    expect(r.margins.gainMargin).toBeCloseTo(Math.PI / (2 * kc * k * theta), 6);
    // On the curve, |L| = kc·k/ω and −180° is crossed at ω = π/(2θ) at distance 1/GM from 0.
    r.w.forEach((w, i) => expect(Math.hypot(r.re[i]!, r.im[i]!)).toBeCloseTo((kc * k) / w, 8));
    expect(r.w[0]).toBeCloseTo(wgc / 100, 10);
    expect(r.circle.re.length).toBeGreaterThan(0);
  });
});
