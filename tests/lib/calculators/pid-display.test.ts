import { describe, expect, it } from 'vitest';
import { convertForm, settingRows, settingsText } from '../../../src/lib/calculators/pid-display';

/**
 * Series (interacting) K', Ti', Td' to ideal: Kc = K'(1 + Td'/Ti'), Ti = Ti' + Td',
 * Td = Ti'·Td'/(Ti' + Td'); ideal to parallel: Kp = Kc, Ki = Kc/Ti, Kd = Kc·Td.
 * Åström & Hägglund, "Advanced PID Control" (2006), §3.4 (section from memory); exact for an
 * unfiltered derivative, so the checks use a huge filter divisor N.
 */
const N = 1e9;
const table = [
  { series: { kc: 2, ti: 40, td: 10 }, source: 'A&H 2006 §3.4 series→ideal' },
  { series: { kc: 0.6, ti: 120, td: 15 }, source: 'A&H 2006 §3.4 series→ideal' },
];

describe('convertForm', () => {
  for (const row of table) {
    it(`turns series Kc=${row.series.kc}, Ti=${row.series.ti} s, Td=${row.series.td} s into ideal and parallel (${row.source})`, () => {
      const { kc, ti, td } = row.series;
      const ideal = convertForm({ form: 'series', kc, ti, td, n: N }, 'ideal');
      expect(ideal?.form).toBe('ideal');
      if (ideal?.form !== 'ideal') return;
      expect(ideal.kc).toBeCloseTo(kc * (1 + td / ti), 6);
      expect(ideal.ti).toBeCloseTo(ti + td, 6);
      expect(ideal.td).toBeCloseTo((ti * td) / (ti + td), 6);
      const parallel = convertForm(ideal, 'parallel');
      expect(parallel?.form).toBe('parallel');
      if (parallel?.form !== 'parallel') return;
      expect(parallel.kp).toBeCloseTo(ideal.kc, 9);
      expect(parallel.ki).toBeCloseTo(ideal.kc / ideal.ti!, 9);
      expect(parallel.kd).toBeCloseTo(ideal.kc * ideal.td!, 6);
      const back = convertForm(parallel, 'series');
      expect(back?.form === 'series' && back.kc).toBeCloseTo(kc, 6);
    });
  }

  it('answers null for a series form of an ideal PID with complex zeros (Ti < 4·Td)', () => {
    expect(convertForm({ form: 'ideal', kc: 1, ti: 10, td: 5, n: N }, 'series')).toBeNull();
  });
});

/** PB % = 100/Kc; repeats per minute = 60/Ti (Ti in s); common-practice faceplate units. */
describe('settingRows', () => {
  it('shows gain as a proportional band and the integral as repeats per minute when asked', () => {
    const rows = settingRows({ form: 'ideal', kc: 1.6, ti: 48, td: 6 }, { gain: 'pb', integral: 'rpm', derivative: 'min' });
    expect(rows.find((r) => r.key === 'pb')?.value).toBeCloseTo(62.5, 12);
    expect(rows.find((r) => r.key === 'ri')?.value).toBeCloseTo(1.25, 12);
    expect(rows.find((r) => r.key === 'td')?.value).toBeCloseTo(0.1, 12);
  });

  it('marks integral action off when Ti is 0', () => {
    const rows = settingRows({ form: 'ideal', kc: 2 }, { gain: 'ratio', integral: 's', derivative: 's' });
    expect(rows.find((r) => r.key === 'ti')).toMatchObject({ value: null, unit: 'off' });
    expect(settingsText({ form: 'ideal', kc: 2 }, { gain: 'ratio', integral: 's', derivative: 's' })).toBe('ideal: Kc = 2, Ti = off, Td = 0 s, N = 10');
  });
});
