/**
 * CSV of a calculator's data, as RFC 4180 describes it: one header row, comma-separated,
 * CRLF line ends, fields with a comma, quote or line break quoted and inner quotes doubled.
 * Numbers keep every digit (shortest round-trip form); a missing value is an empty field.
 */

/** One column: its header (with the unit, e.g. "t (s)") and its values, row by row. */
export interface CsvColumn {
  header: string;
  values: ReadonlyArray<number | string | null | undefined>;
}

function field(value: number | string | null | undefined): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** The columns as CSV text; shorter columns leave empty fields below their last value. */
export function buildCsv(columns: readonly CsvColumn[]): string {
  const rows = Math.max(0, ...columns.map((c) => c.values.length));
  const lines = [columns.map((c) => field(c.header)).join(',')];
  for (let i = 0; i < rows; i++) lines.push(columns.map((c) => field(c.values[i])).join(','));
  return `${lines.join('\r\n')}\r\n`;
}

/** A file name from a calculator id and what the file holds, safe on every OS. */
export function exportFileName(id: string, what: string, extension: 'csv' | 'png'): string {
  const slug = `${id}-${what}`.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
  return `${slug || 'loopwright'}.${extension}`;
}
