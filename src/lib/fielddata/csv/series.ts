import { cellIssue, fileIssue, type CsvIssue } from './issue';
import { SECONDS_PER, type ColumnMapping } from './mapping';
import { STEP_TEST_LIMITS } from './limits';
import { parseNumberCell } from './number';
import type { CsvTable } from './table';
import { parseTimestamp } from './timestamp';

/** A step test as numbers: time in s from the first row, PV and controller output in their units. */
export interface StepSeries {
  t: number[];
  pv: number[];
  /** Controller output, or null when the mapping has no output column. */
  co: number[] | null;
  /** The file line each sample came from. */
  lines: number[];
}

export type SeriesResult = { series: StepSeries; issues: CsvIssue[] };

/** Reads the mapped columns, reporting every bad cell and every time that does not increase. */
export function toSeries(table: CsvTable, mapping: ColumnMapping): SeriesResult {
  const issues: CsvIssue[] = [...table.issues];
  for (const [role, spec] of [['time', mapping.time], ['process-value', mapping.pv], ['controller-output', mapping.co]] as const) {
    if (spec && spec.column > table.columns) {
      issues.push(fileIssue(`The ${role} column ${spec.column} does not exist: the file has ${table.columns} columns.`));
    }
  }
  if (issues.length > table.issues.length) return { series: { t: [], pv: [], co: null, lines: [] }, issues };

  const header = table.header;
  const t: number[] = [];
  const pv: number[] = [];
  const co: number[] | null = mapping.co ? [] : null;
  const lines: number[] = [];
  let origin: number | null = null;
  let previous: { value: number; line: number } | null = null;

  for (const row of table.rows) {
    const bad = issues.length;
    const time = readTime(row.cells[mapping.time.column - 1], row.line, mapping, table, issues);
    const value = readNumber(row.cells[mapping.pv.column - 1], row.line, mapping.pv.column, table, issues);
    const out = mapping.co ? readNumber(row.cells[mapping.co.column - 1], row.line, mapping.co.column, table, issues) : 0;
    if (time !== null) {
      origin ??= time;
      const seconds = time - origin;
      if (previous && seconds <= previous.value) {
        issues.push(
          cellIssue(row.line, mapping.time.column, header, `the time ${fmt(seconds)} s is not later than ${fmt(previous.value)} s on line ${previous.line}.`),
        );
      } else previous = { value: seconds, line: row.line };
      if (issues.length === bad) t.push(seconds);
    }
    if (issues.length === bad && value !== null && out !== null) {
      pv.push(value);
      co?.push(out);
      lines.push(row.line);
    }
  }
  if (issues.length === 0 && t.length < STEP_TEST_LIMITS.minRows) {
    issues.push(fileIssue(`The file has ${t.length} data rows; a step test needs at least ${STEP_TEST_LIMITS.minRows}.`));
  }
  return { series: { t, pv, co, lines }, issues };
}

/** Time in s (the caller subtracts the first row's), or null with an issue recorded. */
function readTime(cell: string, line: number, mapping: ColumnMapping, table: CsvTable, issues: CsvIssue[]): number | null {
  const { column, unit } = mapping.time;
  if (cell.trim() === '') {
    issues.push(cellIssue(line, column, table.header, 'the cell is empty.'));
    return null;
  }
  if (unit === 'timestamp') {
    const ms = parseTimestamp(cell);
    if (ms === null) {
      issues.push(cellIssue(line, column, table.header, `"${cell.trim()}" is not a date and time (use ISO 8601 or YYYY-MM-DD hh:mm:ss).`));
    }
    return ms === null ? null : ms / 1000;
  }
  const n = parseNumberCell(cell, table.dialect.decimal);
  if (n === null) {
    issues.push(cellIssue(line, column, table.header, `"${cell.trim()}" is not a time in ${UNIT_WORDS[unit]}.`));
  }
  return n === null ? null : n * SECONDS_PER[unit];
}

const UNIT_WORDS = { s: 'seconds', ms: 'milliseconds', min: 'minutes', h: 'hours' } as const;

function readNumber(cell: string, line: number, column: number, table: CsvTable, issues: CsvIssue[]): number | null {
  if (cell.trim() === '') {
    issues.push(cellIssue(line, column, table.header, 'the cell is empty.'));
    return null;
  }
  const n = parseNumberCell(cell, table.dialect.decimal);
  if (n === null) {
    const hint = table.dialect.decimal === ',' ? ' (this file uses decimal commas)' : '';
    issues.push(cellIssue(line, column, table.header, `"${cell.trim()}" is not a number${hint}.`));
  }
  return n;
}

/** Up to 6 significant digits, no trailing zeros. */
function fmt(x: number): string {
  return String(Number(x.toPrecision(6)));
}
