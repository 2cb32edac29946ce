import { describe, expect, it } from 'vitest';
import { factor } from '../../../src/lib/control/frequency';
import { margins, reduceDeg } from '../../../src/lib/control/margins';
import fixtures from '../../reference/fixtures/margins.json';

const DEG = 180 / Math.PI;

describe('margins', () => {
  // Closed form for L = K·e^(−θs)/s (Åström & Murray, Feedback Systems, 2008, §10.3; also
  // Skogestad & Postlethwaite §2.6): gain crossover K, PM = 90° − Kθ·180/π, phase crossover
  // π/(2θ), GM = π/(2Kθ). Tolerance rel 1e-10.
  const rows = [
    { k: 0.5, theta: 1 },
    { k: 0.1, theta: 4 },
    { k: 2, theta: 0.05 },
    { k: 1e-3, theta: 300 },
  ];
  for (const { k, theta } of rows) {
    it(`follows the closed form of K·e^(−θs)/s for K = ${k}, θ = ${theta}`, () => {
      const m = margins(factor([{ num: [k], den: [1, 0], delay: theta }]));
      expect(m.gainCrossover! / k).toBeCloseTo(1, 10);
      expect(m.phaseMarginDeg!).toBeCloseTo(90 - k * theta * DEG, 8);
      expect(m.phaseCrossover! * (2 * theta) / Math.PI).toBeCloseTo(1, 10);
      expect(m.gainMargin! / (Math.PI / (2 * k * theta))).toBeCloseTo(1, 10);
      expect(m.gainMarginDb!).toBeCloseTo(20 * Math.log10(Math.PI / (2 * k * theta)), 8);
      expect(m.delayMargin!).toBeCloseTo(((90 - k * theta * DEG) / DEG) / k, 8);
    });
  }

  // Source: tests/reference/fixtures/margins.json (scipy brentq on the exact functions). rel 1e-8.
  for (const c of fixtures.cases) {
    it(`matches the scipy reference for ${c.name}`, () => {
      const m = margins(factor(c.blocks));
      const close = (a: number | null, b: number | null) => {
        if (b === null) return expect(a).toBeNull();
        expect(Math.abs(a! - b)).toBeLessThan(1e-8 * Math.max(1, Math.abs(b)));
      };
      close(m.gainCrossover, c.gainCrossover);
      close(m.phaseMarginDeg, c.phaseMarginDeg);
      close(m.phaseCrossover, c.phaseCrossover);
      close(m.gainMargin, c.gainMargin);
      close(m.delayMargin, c.delayMargin);
      expect(m.gainCrossovers.length).toBe(c.gainCrossovers.length);
      c.firstPhaseCrossovers.forEach((w, i) => close(m.phaseCrossovers[i], w));
      expect(Math.abs(m.ms - c.ms)).toBeLessThan(1e-7 * c.ms);
      expect(Math.abs(m.mt - c.mt)).toBeLessThan(1e-7 * c.mt);
    });
  }

  it('gives third-order 8/(s+1)³ a gain margin of exactly 1 at w = √3 (Routh closed form)', () => {
    const m = margins(factor([{ num: [8], den: [1, 3, 3, 1], delay: 0 }]));
    expect(m.phaseCrossover!).toBeCloseTo(Math.sqrt(3), 10);
    expect(m.gainMargin!).toBeCloseTo(1, 10);
  });

  it('reports no phase crossover when the phase only starts at −180° (1/s² with a lead zero)', () => {
    const m = margins(factor([{ num: [1, 1], den: [1, 0, 0], delay: 0 }]));
    expect(m.phaseCrossover).toBeNull();
    expect(m.gainMargin).toBeNull();
    expect(m.phaseMarginDeg!).toBeGreaterThan(0);
  });

  it('reports null margins when |L| never crosses 1', () => {
    const m = margins(factor([{ num: [0.2], den: [1, 1], delay: 0 }]));
    expect(m.gainCrossover).toBeNull();
    expect(m.phaseMarginDeg).toBeNull();
    expect(m.delayMargin).toBeNull();
    expect(m.ms).toBeCloseTo(1, 6);
  });

  it('lists every gain crossover lowest first for a loop with a resonance (three crossings)', () => {
    // |L| = 2/(s(s²+0.1s+1))... crosses 1 below, at and above the resonance; brentq-style check:
    const m = margins(factor([{ num: [0.3], den: [1, 0.02, 1, 0], delay: 0 }]));
    expect(m.gainCrossovers.length).toBe(3);
    for (let i = 1; i < 3; i++) expect(m.gainCrossovers[i]).toBeGreaterThan(m.gainCrossovers[i - 1]);
  });

  it('stays correct for time constants from 1 ms to 10 000 s in one loop', () => {
    // L = 100/((10⁴s + 1)(10⁻³s + 1)): crossover near 100/10⁴ = 0.01 rad/s, PM close to 90°.
    const m = margins(factor([{ num: [100], den: [10, 10000.001, 1], delay: 0 }]));
    const w = m.gainCrossover!;
    const mag = 100 / Math.hypot(1, 1e4 * w) / Math.hypot(1, 1e-3 * w);
    expect(mag).toBeCloseTo(1, 10);
    expect(m.phaseMarginDeg!).toBeCloseTo(180 - (Math.atan(1e4 * w) + Math.atan(1e-3 * w)) * DEG, 8);
  });
});

describe('reduceDeg', () => {
  it('maps angles into (−180, 180]', () => {
    const table: [number, number][] = [[180, 180], [-180, 180], [200, -160], [-200, 160], [540, 180], [0, 0], [-90, -90]];
    for (const [x, y] of table) expect(reduceDeg(x)).toBeCloseTo(y, 12);
  });
});
