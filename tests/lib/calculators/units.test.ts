import { describe, expect, it } from 'vitest';
import { formatNumber, formatWithUnit, parseQuantity, type QuantityKind } from '../../../src/lib/calculators/units';

/**
 * Unit conversions the trade uses. Sources: SI (1 min = 60 s, 1 h = 3600 s, 1 ms = 1e-3 s);
 * proportional band PB % = 100 / controller gain and integral rate in repeats per minute =
 * 1 / ti (ti in min) — ISA-5.1-era controller conventions as restated in Åström & Hägglund,
 * "Advanced PID Control" (2006), §3.3; common practice in DCS faceplates.
 */
const cases: Array<{ text: string; kind: QuantityKind; value: number; unit: string; source: string }> = [
  { text: '120', kind: 'time', value: 120, unit: 's', source: 'bare number in a time field is seconds (our convention)' },
  { text: '120 s', kind: 'time', value: 120, unit: 's', source: 'SI' },
  { text: '2 min', kind: 'time', value: 120, unit: 'min', source: 'SI: 1 min = 60 s' },
  { text: '2min', kind: 'time', value: 120, unit: 'min', source: 'SI: 1 min = 60 s' },
  { text: '1.5 h', kind: 'time', value: 5400, unit: 'h', source: 'SI: 1 h = 3600 s' },
  { text: '250 ms', kind: 'time', value: 0.25, unit: 'ms', source: 'SI: 1 ms = 1e-3 s' },
  { text: ' 3.5 Seconds ', kind: 'time', value: 3.5, unit: 's', source: 'SI' },
  { text: '1e2 s', kind: 'time', value: 100, unit: 's', source: 'exponent notation' },
  { text: '0.5 repeats/min', kind: 'integral', value: 120, unit: 'repeats/min', source: 'ti = 1/(0.5 /min) = 2 min = 120 s (Åström & Hägglund 2006 §3.3)' },
  { text: '4 rpm', kind: 'integral', value: 15, unit: 'repeats/min', source: 'ti = 1/4 min = 15 s' },
  { text: '1.5 min', kind: 'integral', value: 90, unit: 'min', source: 'SI' },
  { text: '150 %PB', kind: 'gain', value: 100 / 150, unit: '%PB', source: 'PB = 100/Kc (Åström & Hägglund 2006 §3.3)' },
  { text: 'PB 150', kind: 'gain', value: 100 / 150, unit: '%PB', source: 'PB = 100/Kc' },
  { text: 'pb 50%', kind: 'gain', value: 2, unit: '%PB', source: 'PB = 100/Kc' },
  { text: '200 %', kind: 'gain', value: 0.5, unit: '%PB', source: 'PB = 100/Kc; a % in a gain field is a band (our convention)' },
  { text: '2.1', kind: 'gain', value: 2.1, unit: '', source: 'plain ratio' },
  { text: '-0.8', kind: 'plain', value: -0.8, unit: '', source: 'plain number' },
  { text: '−0.8', kind: 'plain', value: -0.8, unit: '', source: 'Unicode minus sign as typographers type it' },
];

describe('parseQuantity', () => {
  for (const c of cases) {
    it(`reads "${c.text}" as a ${c.kind} of ${c.value} in the base unit (${c.source})`, () => {
      const parsed = parseQuantity(c.text, c.kind);
      expect(parsed.ok).toBe(true);
      if (!parsed.ok) return;
      expect(parsed.value).toBeCloseTo(c.value, 12);
      expect(parsed.unit).toBe(c.unit);
    });
  }

  const refused: Array<{ text: string; kind: QuantityKind }> = [
    { text: '', kind: 'time' },
    { text: 'abc', kind: 'time' },
    { text: '2 furlongs', kind: 'time' },
    { text: '150 %', kind: 'time' },
    { text: '2 min', kind: 'plain' },
    { text: '0 rpm', kind: 'integral' },
    { text: '0 %', kind: 'gain' },
    { text: '5 s', kind: 'gain' },
    { text: 'min 2', kind: 'time' },
    { text: '1,5', kind: 'plain' },
  ];
  for (const c of refused) {
    it(`refuses "${c.text}" in a ${c.kind} field with a sentence saying what it expects`, () => {
      const parsed = parseQuantity(c.text, c.kind);
      expect(parsed.ok).toBe(false);
      if (parsed.ok) return;
      expect(parsed.message).toMatch(/\.$/);
      expect(parsed.message.length).toBeGreaterThan(20);
    });
  }
});

describe('formatNumber', () => {
  it('shows four significant digits and a dash for no value', () => {
    expect(formatNumber(2.123456)).toBe('2.123');
    expect(formatNumber(120)).toBe('120');
    expect(formatNumber(0.000012346)).toBe('1.235e-5');
    expect(formatNumber(null)).toBe('—');
    expect(formatNumber(Number.NaN)).toBe('—');
  });
});

describe('formatWithUnit', () => {
  it('spaces units as SI does (a space before % and s), none before the degree sign, nothing after a missing value', () => {
    expect(formatWithUnit(63.321, '°')).toBe('63.32°');
    expect(formatWithUnit(4.2, '%')).toBe('4.2 %');
    expect(formatWithUnit(12, 's')).toBe('12 s');
    expect(formatWithUnit(null, 's')).toBe('—');
    expect(formatWithUnit(1.5, '')).toBe('1.5');
  });
});
