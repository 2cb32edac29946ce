import { describe, expect, it } from 'vitest';
import { autoGrid, factor, frequencyResponse, magnitudeAt, nyquist, phaseAt } from '../../../src/lib/control/frequency';
import fixtures from '../../reference/fixtures/frequency-responses.json';

describe('frequencyResponse', () => {
  // Source: tests/reference/fixtures/frequency-responses.json (scipy.signal.freqresp magnitude,
  // numpy root angles for the continuous phase). Tolerances: rel 1e-9 magnitude, 1e-7° phase.
  for (const c of fixtures.cases) {
    it(`matches scipy for ${c.name}`, () => {
      const r = frequencyResponse(factor([c.tf]), c.w);
      r.mag.forEach((m, i) => expect(Math.abs(m - c.mag[i])).toBeLessThan(1e-9 * c.mag[i]));
      r.phaseDeg.forEach((p, i) => expect(Math.abs(p - c.phaseDeg[i])).toBeLessThan(1e-7));
    });
  }
});

describe('phaseAt', () => {
  it('gives −270° for 1/s³ at every frequency, not +90° (continuous phase, contract definition)', () => {
    const m = factor([{ num: [1], den: [1, 0, 0, 0], delay: 0 }]);
    for (const w of [1e-3, 1, 1e3]) expect(phaseAt(m, w)).toBeCloseTo(-270, 12);
  });

  it('starts near 0° for a stable positive-gain system and keeps falling with dead time', () => {
    const m = factor([{ num: [2], den: [5, 1], delay: 3 }]);
    expect(phaseAt(m, 1e-6)).toBeCloseTo(0, 3);
    // −atan(5w) − 3w in degrees (closed form); at w = 10: about −1808°.
    expect(phaseAt(m, 10)).toBeCloseTo((-Math.atan(50) - 30) * (180 / Math.PI), 9);
  });

  it('adds 180° for a negative leading gain (contract definition)', () => {
    const m = factor([{ num: [-1], den: [1, 1], delay: 0 }]);
    expect(phaseAt(m, 1)).toBeCloseTo(180 - 45, 12);
  });

  it('does not depend on how densely w is sampled', () => {
    const m = factor([{ num: [1], den: [1, 0.1, 1], delay: 2 }]);
    const coarse = frequencyResponse(m, [0.5, 5]).phaseDeg;
    const fine = frequencyResponse(m, Array.from({ length: 1000 }, (_, i) => 0.5 + (4.5 * i) / 999)).phaseDeg;
    expect(coarse[1]).toBe(fine[999]);
  });
});

describe('magnitudeAt', () => {
  it('stays accurate for a high order: |1/(s+1)^20| at w = 100 is (1 + 10⁴)^−10 (closed form, rel 1e-10)', () => {
    const den = [1];
    for (let i = 0; i < 20; i++) {
      for (let j = den.length; j > 0; j--) den[j] = (den[j] ?? 0) + den[j - 1];
    }
    const m = factor([{ num: [1], den, delay: 0 }]);
    const expected = (1 + 1e4) ** -10;
    expect(Math.abs(magnitudeAt(m, 100) - expected)).toBeLessThan(1e-10 * expected);
  });
});

describe('autoGrid', () => {
  it('spans two decades around the time scales of poles, zeros and dead time', () => {
    const w = autoGrid(factor([{ num: [1], den: [100, 1], delay: 0.5 }]), { points: 50 });
    expect(w).toHaveLength(50);
    expect(w[0]).toBeCloseTo(1e-4, 12);
    expect(w[49]).toBeCloseTo(200, 9);
  });
});

describe('nyquist', () => {
  it('gives L(jw) as re and im: 1/(s+1) at w = 1 is 0.5 − 0.5j (closed form)', () => {
    const r = nyquist(factor([{ num: [1], den: [1, 1], delay: 0 }]), [1]);
    expect(r.re[0]).toBeCloseTo(0.5, 14);
    expect(r.im[0]).toBeCloseTo(-0.5, 14);
  });
});
