/**
 * Step-test CSV files: decode and check the bytes, split into a table, map columns, read the
 * series. Pure: no file system, no database; the same code runs for preview and for upload.
 */
import type { CsvIssue } from './issue';
import { STEP_TEST_LIMITS } from './limits';
import type { ColumnMapping } from './mapping';
import { toSeries, type StepSeries } from './series';
import { suggestMapping } from './suggest';
import { parseTable, type CsvTable } from './table';
import { decodeUpload, normalizeText } from './text';

export * from './issue';
export * from './limits';
export * from './mapping';
export type { CsvTable, TableRow } from './table';
export type { StepSeries } from './series';
export type { Dialect, Delimiter } from './dialect';
export { parseTable, suggestMapping, toSeries };

/** A file read as a table (for preview and mapping), or the issue that stops it. */
export type ReadResult = { table: CsvTable; issue: null } | { table: null; issue: CsvIssue };

/** Reads bytes (an upload) or text into a table; whole-file problems stop here. */
export function readStepTestFile(input: Uint8Array | string): ReadResult {
  const decoded = typeof input === 'string' ? normalizeText(input) : decodeUpload(input);
  if (decoded.issue) return { table: null, issue: decoded.issue };
  return parseTable(decoded.text);
}

/** The outcome of reading a file with a mapping: the series, or every issue (the first ones listed). */
export type StepTestParse =
  | { ok: true; table: CsvTable; series: StepSeries }
  | { ok: false; issues: CsvIssue[]; issueCount: number };

/** Reads a whole step test with a mapping (the suggested one when none is given). */
export function parseStepTest(input: Uint8Array | string, mapping?: ColumnMapping): StepTestParse {
  const read = readStepTestFile(input);
  if (read.issue) return { ok: false, issues: [read.issue], issueCount: 1 };
  const { series, issues } = toSeries(read.table, mapping ?? suggestMapping(read.table));
  if (issues.length > 0) {
    const sorted = [...issues].sort((a, b) => (a.line ?? 0) - (b.line ?? 0));
    return { ok: false, issues: sorted.slice(0, STEP_TEST_LIMITS.maxListedIssues), issueCount: issues.length };
  }
  return { ok: true, table: read.table, series };
}
