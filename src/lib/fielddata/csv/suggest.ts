import type { ColumnMapping, TimeUnit } from './mapping';
import { parseNumberCell } from './number';
import type { CsvTable } from './table';
import { parseTimestamp } from './timestamp';

const TIME_NAME = /\b(time|t|zeit|tid|temps|timestamp|date|sec|seconds?)\b/i;
const CO_NAME = /\b(co|op|out|output|mv|cv|valve|vlv|ventil|u)\b|\.out\b|stellgr/i;
const UNIT_IN_NAME = /[[(]\s*([^\])]{1,24}?)\s*[\])]\s*$/;

/**
 * A first guess at the column mapping for the preview, from header names and the first data row:
 * time is the column of dates or named like time (else the first), controller output a column
 * named like an output (CO, OP, MV, valve), the process value the first remaining numeric column.
 * Units come from "[°C]" or "(%)" at the end of a header name. The user confirms or changes it.
 */
export function suggestMapping(table: CsvTable): ColumnMapping {
  const names = table.header ?? [];
  const first = table.rows[0]?.cells ?? [];
  const columns = Array.from({ length: table.columns }, (_, i) => i);
  const byName = (re: RegExp) => columns.find((i) => re.test(names[i] ?? '') || re.test(stripUnit(names[i] ?? '')));

  const time = columns.find((i) => parseTimestamp(first[i] ?? '') !== null) ?? byName(TIME_NAME) ?? 0;
  const co = table.columns >= 3 ? (columns.find((i) => i !== time && (CO_NAME.test(stripUnit(names[i] ?? '')))) ?? null) : null;
  const numeric = (i: number) => parseNumberCell(first[i] ?? '', table.dialect.decimal) !== null;
  const pv = columns.find((i) => i !== time && i !== co && numeric(i)) ?? columns.find((i) => i !== time) ?? 1;
  const coGuess = co ?? (table.columns >= 3 ? (columns.find((i) => i !== time && i !== pv && numeric(i)) ?? null) : null);

  return {
    time: { column: time + 1, unit: timeUnit(first[time] ?? '', names[time] ?? '') },
    pv: { column: pv + 1, unit: unitOf(names[pv]) },
    co: coGuess === null ? null : { column: coGuess + 1, unit: unitOf(names[coGuess]) || '%' },
  };
}

function timeUnit(cell: string, name: string): TimeUnit {
  if (parseTimestamp(cell) !== null) return 'timestamp';
  const unit = unitOf(name).toLowerCase();
  if (unit === 'ms') return 'ms';
  if (unit === 'min') return 'min';
  if (unit === 'h') return 'h';
  return 's';
}

function unitOf(name: string | undefined): string {
  return UNIT_IN_NAME.exec(name ?? '')?.[1] ?? '';
}

function stripUnit(name: string): string {
  return name.replace(UNIT_IN_NAME, '').trim();
}
