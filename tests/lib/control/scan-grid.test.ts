import { describe, expect, it } from 'vitest';
import { maximizeLog, scanGrid, seedScan, loopScan } from '../../../src/lib/control/scan-grid';
import { autoGrid, factor, frequencyResponse } from '../../../src/lib/control/frequency';
import { margins } from '../../../src/lib/control/margins';
import { pidToTransferFunction } from '../../../src/lib/control/pid';

describe('maximizeLog', () => {
  it('finds the resonance peak of a second-order lag: Mr = 1/(2ζ√(1−ζ²)) at wr = wn√(1−2ζ²) (handbook closed form)', () => {
    const zeta = 0.2, wn = 3;
    let calls = 0;
    const mag = (w: number) => {
      calls++;
      const re = wn * wn - w * w, im = 2 * zeta * wn * w;
      return (wn * wn) / Math.hypot(re, im);
    };
    const peak = maximizeLog(mag, 1, 5);
    expect(peak.value).toBeCloseTo(1 / (2 * zeta * Math.sqrt(1 - zeta * zeta)), 12);
    expect(peak.w).toBeCloseTo(wn * Math.sqrt(1 - 2 * zeta * zeta), 6);
    // Parabolic steps: far fewer evaluations than golden sections alone (about 40 to this tolerance).
    expect(calls).toBeLessThan(30);
  });
});

describe('loopScan', () => {
  // Brindlewood HTST hot-water set (the engine benchmark's loop, fictional numbers).
  const blocks = [
    pidToTransferFunction({ form: 'ideal', kc: 1.1, ti: 26, td: 4, n: 10 }, 'controller'),
    { num: [1.8], den: [24, 1], delay: 3.5 },
    { num: [1], den: [6, 1], delay: 0 },
    { num: [1], den: [2, 1], delay: 0 },
    { num: [1], den: [0.8, 1], delay: 0 },
  ];

  it('gives the same margins whether or not a frequency response seeds the scan (crossings refined on the exact function)', () => {
    const plain = margins(factor(blocks));
    const m = factor(blocks);
    const response = frequencyResponse(m, autoGrid(m, { points: 200 }));
    seedScan(m, response);
    const seeded = margins(m);
    // Inside the response's range the scan takes its points (thinned to its own density), besides root frequencies.
    const w = loopScan(m).w;
    const seedPoints = new Set(response.w);
    const roots = new Set([...m.poles, ...m.zeros].map((r) => Math.hypot(r.re, r.im)));
    const inside = w.filter((x) => x >= response.w[0] && x <= response.w[199]);
    expect(inside.filter((x) => seedPoints.has(x)).length).toBeGreaterThan(60);
    inside.forEach((x) => expect(seedPoints.has(x) || [...roots].some((r) => Math.abs(r - x) <= 1e-12 * r)).toBe(true));
    for (let i = 1; i < w.length; i++) expect(w[i] / w[i - 1]).toBeLessThanOrEqual(10 ** (1 / 16) * (1 + 1e-12));
    for (const key of ['gainMargin', 'phaseMarginDeg', 'gainCrossover', 'phaseCrossover', 'delayMargin', 'ms', 'mt', 'bandwidth'] as const) {
      expect(Math.abs(seeded[key]! - plain[key]!)).toBeLessThan(1e-9 * Math.abs(plain[key]!));
    }
    expect(seeded.phaseCrossovers.length).toBe(plain.phaseCrossovers.length);
  });

  it('ignores a seed sparser than 16 points per decade (the scan keeps its own density)', () => {
    const m = factor(blocks);
    seedScan(m, frequencyResponse(m, autoGrid(m, { points: 20 })));
    expect(loopScan(m).w).toEqual(scanGrid(factor(blocks)));
  });
});
