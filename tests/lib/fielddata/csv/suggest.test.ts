import { describe, expect, it } from 'vitest';
import { readStepTestFile, suggestMapping } from '../../../../src/lib/fielddata/csv';

describe('suggestMapping', () => {
  it('finds time, PV and output columns and their units from header names', () => {
    const r = readStepTestFile('TIC-210.OUT [%];Zeit [min];TIC-210.PV [°C]\n30;0;71,5\n');
    expect(suggestMapping(r.table!)).toEqual({
      time: { column: 2, unit: 'min' },
      pv: { column: 3, unit: '°C' },
      co: { column: 1, unit: '%' },
    });
  });

  it('takes a column of dates as time and leaves the output out of a two-column file', () => {
    const r = readStepTestFile('2026-03-14 08:00:00,1.5\n2026-03-14 08:00:01,1.6\n');
    expect(suggestMapping(r.table!)).toEqual({ time: { column: 1, unit: 'timestamp' }, pv: { column: 2, unit: '' }, co: null });
  });
});
