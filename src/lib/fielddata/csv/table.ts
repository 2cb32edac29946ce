import Papa from 'papaparse';
import { detectDecimal, detectDelimiter, type Dialect } from './dialect';
import { fileIssue, rowIssue, type CsvIssue } from './issue';
import { STEP_TEST_LIMITS } from './limits';
import { parseNumberCell } from './number';
import { parseTimestamp } from './timestamp';

/** One data row with the line it starts on. */
export interface TableRow {
  /** 1-based line in the file. */
  line: number;
  cells: string[];
}

/** A step-test file split into cells; rows with the wrong cell count are issues, not rows. */
export interface CsvTable {
  dialect: Dialect;
  /** Column names from the header row, or null when the file has none. */
  header: string[] | null;
  /** Number of columns (from the header, else the first data row). */
  columns: number;
  rows: TableRow[];
  issues: CsvIssue[];
}

export type TableResult = { table: CsvTable; issue: null } | { table: null; issue: CsvIssue };

/** Splits normalized text (see decodeUpload) into a table, with every malformed row reported. */
export function parseTable(text: string): TableResult {
  const delimiter = detectDelimiter(text);
  if (!delimiter) {
    return {
      table: null,
      issue: fileIssue(
        'Only one column was found: a step test needs a time and a process-value column separated by commas, semicolons or tabs.',
      ),
    };
  }
  const dialect: Dialect = { delimiter, decimal: detectDecimal(text, delimiter) };
  const lines = lineLocator(text);
  const rows: TableRow[] = [];
  const issues: CsvIssue[] = [];
  let header: string[] | null = null;
  let columns = 0;
  let tooMany = false;
  let previousCursor = 0;

  Papa.parse<string[]>(text, {
    delimiter,
    // Empty lines are skipped by the parser; lines of only spaces (cheaper to test here than
    // with its "greedy" option) are skipped below.
    skipEmptyLines: true,
    step(result, parser) {
      if (isBlank(result.data)) return;
      const { start: line, end: endLine } = lines.rowLines(previousCursor, result.meta.cursor);
      previousCursor = result.meta.cursor;
      const cells = trimTrailingEmpty(result.data, columns);
      if (columns === 0) {
        columns = cells.length;
        if (isHeader(cells, dialect)) {
          header = cells.map((c) => c.trim());
          return;
        }
      }
      if (result.errors.length > 0 || endLine !== line) {
        issues.push(rowIssue(line, quoteProblem(result.errors[0]?.code, endLine !== line)));
      } else if (cells.length !== columns) {
        issues.push(rowIssue(line, `expected ${columns} cells, found ${cells.length}.`));
      } else {
        if (rows.length === STEP_TEST_LIMITS.maxRows) {
          tooMany = true;
          parser.abort();
          return;
        }
        rows.push({ line, cells });
      }
    },
  });

  if (tooMany) {
    return {
      table: null,
      issue: fileIssue('The file has more than 200 000 data rows; a step test may have at most 200 000.'),
    };
  }
  return { table: { dialect, header, columns, rows, issues }, issue: null };
}

function isBlank(cells: string[]): boolean {
  for (const c of cells) if (c.trim() !== '') return false;
  return true;
}

/** A header row has a non-empty cell that is neither a number nor a date and time. */
function isHeader(cells: string[], dialect: Dialect): boolean {
  return cells.some((c) => c.trim() !== '' && parseNumberCell(c, dialect.decimal) === null && parseTimestamp(c) === null);
}

/**
 * "1;2;" has two cells, not three: spreadsheet exports often end rows with a separator. Only
 * cells beyond the expected count are dropped (all trailing empties for the first row).
 */
function trimTrailingEmpty(cells: string[], columns: number): string[] {
  let n = cells.length;
  while (n > Math.max(1, columns) && cells[n - 1].trim() === '') n--;
  return n === cells.length ? cells : cells.slice(0, n);
}

function quoteProblem(code: string | undefined, spansLines: boolean): string {
  if (spansLines) return 'a quoted cell runs over several lines; a step-test file has one row per line.';
  if (code === 'MissingQuotes') return 'a quoted cell is not closed.';
  return 'the row is not valid CSV (check its quotes).';
}

/** Maps character positions to 1-based line numbers; positions must not go backwards. */
function lineLocator(text: string) {
  let pos = 0;
  let line = 1;
  /** Line of the character at p. */
  function lineAt(p: number): number {
    for (; pos < p; pos++) if (text.charCodeAt(pos) === 10) line++;
    return line;
  }
  return {
    /** Where a row reported by the parser starts and ends (its cursor is just past it). */
    rowLines(from: number, cursor: number): { start: number; end: number } {
      let p = from;
      // Skip the blank lines the parser skipped before this row.
      for (let lineStart = p; p < cursor; p++) {
        const c = text.charCodeAt(p);
        if (c === 10) lineStart = p + 1;
        else if (c !== 32 && c !== 9) {
          p = lineStart;
          break;
        }
      }
      const start = lineAt(p);
      const last = text[cursor - 1] === '\n' ? cursor - 2 : cursor - 1;
      return { start, end: lineAt(Math.max(p, last)) };
    },
  };
}
