/** One problem found in an uploaded file, tied to its line (1-based, as an editor numbers them). */
export interface CsvIssue {
  /** Line in the file, counting the header and blank lines; null for whole-file problems. */
  line: number | null;
  /** Column, 1-based; null when the whole row or file is at fault. */
  column: number | null;
  /** The sentence shown to the user, starting with "Line N" when the line is known. */
  message: string;
}

/** Names a cell for a message: `Line 7, column 2 (PV)`. */
export function cellLabel(line: number, column: number, header: string[] | null): string {
  const name = header?.[column - 1]?.trim();
  return `Line ${line}, column ${column}${name ? ` (${name})` : ''}`;
}

export function fileIssue(message: string): CsvIssue {
  return { line: null, column: null, message };
}

export function rowIssue(line: number, message: string): CsvIssue {
  return { line, column: null, message: `Line ${line}: ${message}` };
}

export function cellIssue(line: number, column: number, header: string[] | null, message: string): CsvIssue {
  return { line, column, message: `${cellLabel(line, column, header)}: ${message}` };
}
