import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { buildCsv, exportFileName } from '../../../src/lib/calculators/csv';

/** RFC 4180 (Shafranovskiy, 2005), §2: CRLF records, header line, quoting rules 5–7. */
describe('buildCsv', () => {
  it('writes a header row and CRLF-terminated records (RFC 4180 §2 rules 1–3)', () => {
    const text = buildCsv([
      { header: 't (s)', values: [0, 0.5] },
      { header: 'y', values: [0, 0.3934693402873666] },
    ]);
    expect(text).toBe('t (s),y\r\n0,0\r\n0.5,0.3934693402873666\r\n');
  });

  it('quotes fields with commas, quotes and line breaks, doubling inner quotes (RFC 4180 §2 rules 6–7)', () => {
    const text = buildCsv([{ header: 'rule, "tuned"', values: ['SIMC', 'line\nbreak'] }]);
    expect(text).toBe('"rule, ""tuned"""\r\nSIMC\r\n"line\nbreak"\r\n');
  });

  it('leaves empty fields for missing values and shorter columns', () => {
    expect(buildCsv([{ header: 'a', values: [1, null, 3] }, { header: 'b', values: [Number.NaN] }])).toBe('a,b\r\n1,\r\n,\r\n3,\r\n');
  });

  it('parses back to the same numbers with an independent CSV parser (papaparse)', () => {
    const t = Array.from({ length: 50 }, (_, i) => i * 0.37);
    const y = t.map((x) => 1 - Math.exp(-x / 7.3));
    const parsed = Papa.parse<string[]>(buildCsv([{ header: 't (s)', values: t }, { header: 'PV, setpoint step', values: y }]), { skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.data[0]).toEqual(['t (s)', 'PV, setpoint step']);
    expect(parsed.data.slice(1).map((r) => r.map(Number))).toEqual(t.map((x, i) => [x, y[i]]));
  });
});

describe('exportFileName', () => {
  it('makes a lower-case dashed name with the extension', () => {
    expect(exportFileName('htst-TIC210', 'step data', 'csv')).toBe('htst-tic210-step-data.csv');
    expect(exportFileName('', '', 'png')).toBe('loopwright.png');
  });
});
