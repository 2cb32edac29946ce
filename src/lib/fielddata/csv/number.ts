/** The decimal mark a file uses. */
export type DecimalMark = '.' | ',';

const POINT = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const COMMA = /^[+-]?(\d+,?\d*|,\d+)([eE][+-]?\d+)?$/;

/**
 * A number cell in the file's decimal mark, or null when the cell is not a plain number.
 * Thousands separators are refused on purpose: "1.250" is ambiguous between the two conventions.
 */
export function parseNumberCell(cell: string, decimal: DecimalMark): number | null {
  const s = cell.trim();
  if (!(decimal === '.' ? POINT : COMMA).test(s)) return null;
  const value = Number(decimal === '.' ? s : s.replace(',', '.'));
  return Number.isFinite(value) ? value : null;
}

/** True when the cell reads as a number with a decimal comma and not with a point ("0,25"). */
export function hasDecimalComma(cell: string): boolean {
  const s = cell.trim();
  return s.includes(',') && COMMA.test(s);
}

/** True when the cell has a decimal point ("0.25"). */
export function hasDecimalPoint(cell: string): boolean {
  const s = cell.trim();
  return s.includes('.') && POINT.test(s);
}
