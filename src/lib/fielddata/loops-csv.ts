/**
 * The loop register as CSV, one loop a row, with a header naming the columns below (any order
 * on import; unknown columns refused). Tuning: `form` ideal|series|parallel, `gain` (kc or kp),
 * `integral` (ti in time_unit, or ki in 1/time_unit for parallel), `derivative` (td, or kd, in
 * time_unit), `time_unit` s|min, `gain_unit` a label. Empty `form` = no tuning recorded.
 * Text cells that a spreadsheet would run as a formula (= + - @ first) are written with a
 * leading apostrophe, which import removes again.
 */
import Papa from 'papaparse';
import { LoopInputSchema, type Loop, type LoopInput } from '../schemas/loop';
import { cellIssue, fileIssue, parseTable, rowIssue, type CsvIssue } from './csv';
import { parseNumberCell } from './csv/number';
import { decodeUpload } from './csv/text';

export const LOOP_CSV_COLUMNS = [
  'tag', 'area', 'description', 'recipe', 'form', 'gain', 'integral', 'derivative', 'time_unit', 'gain_unit',
  'commissioned_by', 'commissioned_at', 'owner_email',
] as const;
type Column = (typeof LOOP_CSV_COLUMNS)[number];

const TEXT_COLUMNS = new Set<Column>(['tag', 'area', 'description', 'recipe', 'gain_unit', 'commissioned_by', 'owner_email']);

/** The register as CSV text (comma separated, decimal points, CRLF line ends, a header). */
export function loopsToCsv(loops: Loop[]): string {
  const data = loops.map((l) => {
    const row: Record<Column, string> = {
      tag: l.tag, area: l.area, description: l.description, recipe: l.recipeSlug ?? '',
      form: l.tuning?.form ?? '', gain: num(l.tuning?.gain), integral: num(l.tuning?.integral), derivative: num(l.tuning?.derivative),
      time_unit: l.tuning?.timeUnit ?? '', gain_unit: l.tuning?.gainUnit ?? '',
      commissioned_by: l.commissionedBy ?? '', commissioned_at: l.commissionedAt ?? '', owner_email: l.ownerEmail,
    };
    for (const c of TEXT_COLUMNS) row[c] = defuse(row[c]);
    return LOOP_CSV_COLUMNS.map((c) => row[c]);
  });
  return Papa.unparse({ fields: [...LOOP_CSV_COLUMNS], data }, { newline: '\r\n' }) + '\r\n';
}

/** Rows read from an import, each with its line; or every issue found. */
export type LoopCsvRead = { ok: true; loops: { line: number; loop: LoopInput }[] } | { ok: false; issues: CsvIssue[] };

/** Reads and validates a register file; all rows must be valid (the caller writes all or none). */
export function readLoopsCsv(bytes: Uint8Array): LoopCsvRead {
  const decoded = decodeUpload(bytes);
  if (decoded.issue) return { ok: false, issues: [decoded.issue] };
  const parsed = parseTable(decoded.text);
  if (parsed.issue) return { ok: false, issues: [parsed.issue] };
  const { header, rows, dialect } = parsed.table;
  if (!header) return { ok: false, issues: [fileIssue(`The first line must name the columns: ${LOOP_CSV_COLUMNS.join(', ')}.`)] };
  const names = header.map((h) => h.trim().toLowerCase());
  const issues: CsvIssue[] = [...parsed.table.issues];
  const unknown = names.filter((n) => !(LOOP_CSV_COLUMNS as readonly string[]).includes(n));
  if (unknown.length) issues.push(rowIssue(1, `unknown column "${unknown[0]}"; the columns are ${LOOP_CSV_COLUMNS.join(', ')}.`));
  for (const required of ['tag', 'area', 'owner_email'] as const) {
    if (!names.includes(required)) issues.push(rowIssue(1, `the column "${required}" is missing.`));
  }
  if (issues.length) return { ok: false, issues };

  const loops: { line: number; loop: LoopInput }[] = [];
  const seen = new Map<string, number>();
  for (const row of rows) {
    const cell = (c: Column) => {
      const i = names.indexOf(c);
      return i < 0 ? '' : undefuse(row.cells[i]?.trim() ?? '');
    };
    const column = (c: Column) => names.indexOf(c) + 1;
    const numberOf = (c: Column): number | null | 'bad' => {
      const s = cell(c);
      if (s === '') return null;
      return parseNumberCell(s, dialect.decimal) ?? 'bad';
    };
    const before = issues.length;
    let tuning: unknown = null;
    if (cell('form') !== '') {
      const values = { gain: numberOf('gain'), integral: numberOf('integral'), derivative: numberOf('derivative') };
      for (const [k, v] of Object.entries(values)) {
        if (v === 'bad') issues.push(cellIssue(row.line, column(k as Column), header, `"${cell(k as Column)}" is not a number.`));
      }
      if (values.gain === null) {
        const message = 'a loop with a tuning form needs its gain.';
        issues.push(column('gain') > 0 ? cellIssue(row.line, column('gain'), header, message) : rowIssue(row.line, message));
      }
      tuning = { form: cell('form'), gain: values.gain, integral: values.integral, derivative: values.derivative, timeUnit: cell('time_unit') || 's', gainUnit: cell('gain_unit') || '%/%' };
    }
    if (issues.length > before) continue;
    const candidate = {
      tag: cell('tag'), area: cell('area'), description: cell('description'), recipeSlug: cell('recipe') || null, tuning,
      commissionedBy: cell('commissioned_by') || null, commissionedAt: cell('commissioned_at') || null, ownerEmail: cell('owner_email'),
    };
    const result = LoopInputSchema.safeParse(candidate);
    if (!result.success) {
      const issue = result.error.issues[0];
      const index = names.indexOf(columnOfPath(issue.path.map(String)));
      const message = issue.message.replace(/\.?$/, '.');
      issues.push(index < 0 ? rowIssue(row.line, message) : cellIssue(row.line, index + 1, header, message));
      continue;
    }
    const earlier = seen.get(result.data.tag);
    if (earlier) {
      issues.push(rowIssue(row.line, `the tag ${result.data.tag} is already on line ${earlier}.`));
      continue;
    }
    seen.set(result.data.tag, row.line);
    loops.push({ line: row.line, loop: result.data });
  }
  return issues.length ? { ok: false, issues } : { ok: true, loops };
}

const PATH_TO_COLUMN: Record<string, Column> = {
  tag: 'tag', area: 'area', description: 'description', recipeSlug: 'recipe', commissionedBy: 'commissioned_by',
  commissionedAt: 'commissioned_at', ownerEmail: 'owner_email', form: 'form', gain: 'gain', integral: 'integral',
  derivative: 'derivative', timeUnit: 'time_unit', gainUnit: 'gain_unit',
};

function columnOfPath(path: string[]): Column {
  return PATH_TO_COLUMN[path[path.length - 1] ?? ''] ?? PATH_TO_COLUMN[path[0] ?? ''] ?? 'tag';
}

function num(v: number | null | undefined): string {
  return v === null || v === undefined ? '' : String(v);
}

function defuse(s: string): string {
  return /^[=+\-@]/.test(s) ? `'${s}` : s;
}

function undefuse(s: string): string {
  return /^'[=+\-@]/.test(s) ? s.slice(1) : s;
}
