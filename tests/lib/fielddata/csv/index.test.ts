import { describe, expect, it } from 'vitest';
import { parseStepTest, readStepTestFile, type ColumnMapping } from '../../../../src/lib/fielddata/csv';

const enc = (s: string) => new TextEncoder().encode(s);
const MAP3: ColumnMapping = { time: { column: 1, unit: 's' }, pv: { column: 2, unit: '°C' }, co: { column: 3, unit: '%' } };

/** n rows of a plain ramp, written with the given separator and decimal mark. */
function rows(n: number, sep: string, dec: string, start = 0): string {
  return Array.from({ length: n }, (_, i) => [String(start + i), (20 + i / 4).toFixed(2), i < 2 ? '30' : '40'].join(sep).replace(/\./g, dec)).join('\n');
}

describe('parseStepTest', () => {
  it('reads semicolons with decimal commas and a header', () => {
    const r = parseStepTest(enc(`Zeit [s];TIC-210.PV [°C];TIC-210.OUT [%]\n${rows(12, ';', ',')}\n`));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.table.dialect).toEqual({ delimiter: ';', decimal: ',' });
    expect(r.table.header).toEqual(['Zeit [s]', 'TIC-210.PV [°C]', 'TIC-210.OUT [%]']);
    expect(r.series.t.slice(0, 3)).toEqual([0, 1, 2]);
    expect(r.series.pv[1]).toBeCloseTo(20.25, 12);
    expect(r.series.co?.slice(0, 3)).toEqual([30, 30, 40]);
  });

  it('reads tabs without a header', () => {
    const r = parseStepTest(enc(rows(12, '\t', '.')), MAP3);
    expect(r.ok && r.table.header).toBe(null);
    expect(r.ok && r.table.dialect.delimiter).toBe('\t');
    expect(r.ok && r.series.t.length).toBe(12);
  });

  it('drops a byte-order mark and skips blank lines, keeping the file line numbers', () => {
    const text = `\uFEFFtime,pv,co\n\n${rows(6, ',', '.')}\n\n   \n${rows(6, ',', '.', 6)}\n\n`;
    const r = parseStepTest(enc(text), MAP3);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.table.header?.[0]).toBe('time');
    expect(r.series.lines[0]).toBe(3);
    expect(r.series.lines[6]).toBe(11);
    expect(r.series.t.length).toBe(12);
  });

  it('converts timestamps to seconds from the first row (ISO 8601 and YYYY-MM-DD hh:mm:ss, with offsets)', () => {
    const stamps = [
      '2026-03-14 08:15:00', '2026-03-14T08:15:00.5', '2026-03-14T08:15:02Z', '2026-03-14T09:15:03+01:00',
      '2026-03-14 08:15:04', '2026-03-14 08:15:05', '2026-03-14 08:15:06', '2026-03-14 08:15:07',
      '2026-03-14 08:15:08', '2026-03-14 08:16:00',
    ];
    const text = `stamp;pv\n${stamps.map((s, i) => `${s};${i},5`).join('\n')}`;
    const r = parseStepTest(enc(text), { time: { column: 1, unit: 'timestamp' }, pv: { column: 2, unit: 'bar' }, co: null });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.series.t).toEqual([0, 0.5, 2, 3, 4, 5, 6, 7, 8, 60]);
    expect(r.series.pv[0]).toBe(0.5);
    expect(r.series.co).toBe(null);
  });

  it('converts a time column in minutes to seconds', () => {
    const r = parseStepTest(enc(rows(10, ',', '.')), { ...MAP3, time: { column: 1, unit: 'min' } });
    expect(r.ok && r.series.t[3]).toBe(180);
  });

  it('reports a malformed row and a bad cell by line, with the exact messages', () => {
    const lines = rows(12, ';', ',').split('\n');
    lines[4] = '4;21,0';
    lines[7] = '7;21;75;40';
    lines[9] = '9;abc;40';
    const r = parseStepTest(enc(`t;pv;co\n${lines.join('\n')}`), MAP3);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.issues.map((i) => i.message)).toEqual([
      'Line 6: expected 3 cells, found 2.',
      'Line 9: expected 3 cells, found 4.',
      'Line 11, column 2 (pv): "abc" is not a number (this file uses decimal commas).',
    ]);
    expect(r.issues.map((i) => [i.line, i.column])).toEqual([[6, null], [9, null], [11, 2]]);
    expect(r.issueCount).toBe(3);
  });

  it('reports empty cells, bad timestamps and times that go backwards', () => {
    const text = [
      'when,pv',
      '2026-03-14 08:00:00,1', '2026-03-14 08:00:01,', '2026-02-30 08:00:02,1', '2026-03-14 08:00:01,1',
      ...Array.from({ length: 8 }, (_, i) => `2026-03-14 08:00:1${i},1`),
    ].join('\n');
    const r = parseStepTest(enc(text), { time: { column: 1, unit: 'timestamp' }, pv: { column: 2, unit: 'm' }, co: null });
    expect(!r.ok && r.issues.map((i) => i.message)).toEqual([
      'Line 3, column 2 (pv): the cell is empty.',
      'Line 4, column 1 (when): "2026-02-30 08:00:02" is not a date and time (use ISO 8601 or YYYY-MM-DD hh:mm:ss).',
      'Line 5, column 1 (when): the time 1 s is not later than 1 s on line 3.',
    ]);
  });

  it('refuses a file over 5 MB before reading it', () => {
    const big = new Uint8Array(5 * 1024 * 1024 + 1).fill(0x31);
    const r = parseStepTest(big);
    expect(!r.ok && r.issues).toEqual([{ line: null, column: null, message: 'The file is 5.0 MB; a step-test file may be at most 5 MB.' }]);
  });

  it('refuses more than 200 000 data rows', () => {
    const text = `t,pv\n${Array.from({ length: 200_001 }, (_, i) => `${i},1`).join('\n')}`;
    const r = parseStepTest(enc(text));
    expect(!r.ok && r.issues[0].message).toBe('The file has more than 200 000 data rows; a step test may have at most 200 000.');
  });

  it('accepts exactly 200 000 data rows', () => {
    const text = `t,pv\n${Array.from({ length: 200_000 }, (_, i) => `${i},1`).join('\n')}`;
    const r = parseStepTest(enc(text));
    expect(r.ok && r.series.t.length).toBe(200_000);
  });

  it('refuses binary content whatever the file is called', () => {
    const png = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 0x0d, 0x49, 0x48, 0x44, 0x52]);
    expect(!parseStepTest(png).ok && (parseStepTest(png) as { issues: { message: string }[] }).issues[0].message).toBe(
      'The file is not a CSV text file (it contains binary data): export the step test as CSV and upload that.',
    );
  });

  it('refuses text with a single column and an empty file', () => {
    const one = parseStepTest(enc('just some words\nand more words\n'));
    expect(!one.ok && one.issues[0].message).toBe(
      'Only one column was found: a step test needs a time and a process-value column separated by commas, semicolons or tabs.',
    );
    const empty = parseStepTest(enc('\uFEFF\n\n'));
    expect(!empty.ok && empty.issues[0].message).toBe('The file is empty: upload a CSV file with a time column and a process-value column.');
  });

  it('needs at least 10 rows and mapped columns that exist', () => {
    const few = parseStepTest(enc(rows(9, ',', '.')), MAP3);
    expect(!few.ok && few.issues[0].message).toBe('The file has 9 data rows; a step test needs at least 10.');
    const missing = parseStepTest(enc(rows(12, ',', '.')), { ...MAP3, co: { column: 4, unit: '%' } });
    expect(!missing.ok && missing.issues[0].message).toBe('The controller-output column 4 does not exist: the file has 3 columns.');
  });

  it('reads Windows-1252 text (a degree sign from an older historian)', () => {
    const header = Uint8Array.from([...enc('t;T ['), 0xb0, ...enc('C]\n')]);
    const body = enc(rows(10, ';', ','));
    const bytes = new Uint8Array(header.length + body.length);
    bytes.set(header);
    bytes.set(body, header.length);
    const r = readStepTestFile(bytes);
    expect(r.table?.header?.[1]).toBe('T [°C]');
  });

  it('reports a quoted cell that runs over several lines at the line it starts on', () => {
    const text = `t,pv,co\n${rows(5, ',', '.')}\n5,"21\n.0",40\n${rows(6, ',', '.', 6)}`;
    const r = parseStepTest(enc(text), MAP3);
    expect(!r.ok && r.issues.map((i) => i.message)).toEqual(['Line 7: a quoted cell runs over several lines; a step-test file has one row per line.']);
  });
});
