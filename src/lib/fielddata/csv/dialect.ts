import { hasDecimalComma, hasDecimalPoint, type DecimalMark } from './number';

/** Cell separators a step-test file may use. */
export type Delimiter = ',' | ';' | '\t';

/** How a file is written. */
export interface Dialect {
  /** Cell separator. */
  delimiter: Delimiter;
  /** Decimal mark of its numbers. */
  decimal: DecimalMark;
}

/** Tab and semicolon first: a comma may be the decimal mark of a semicolon file. */
const CANDIDATES: Delimiter[] = ['\t', ';', ','];
const SAMPLE_LINES = 50;

/**
 * Guesses the delimiter from the first non-blank lines: the candidate that splits the most lines
 * into the same number (≥ 2) of cells. Written here rather than left to the CSV parser's guess,
 * which knows nothing of decimal commas and picks the comma in "0,5;1,2".
 */
export function detectDelimiter(text: string): Delimiter | null {
  const lines = sampleLines(text);
  let best: { delimiter: Delimiter; share: number } | null = null;
  for (const delimiter of CANDIDATES) {
    const counts = lines.map((l) => l.split(delimiter).length - 1);
    const modal = mode(counts);
    if (modal < 1) continue;
    const share = counts.filter((c) => c === modal).length / counts.length;
    if (!best || share > best.share) best = { delimiter, share };
  }
  return best?.delimiter ?? null;
}

/** Decimal comma when more sample cells read as "0,25" than as "0.25"; a comma file uses points. */
export function detectDecimal(text: string, delimiter: Delimiter): DecimalMark {
  if (delimiter === ',') return '.';
  let comma = 0;
  let point = 0;
  for (const line of sampleLines(text)) {
    for (const cell of line.split(delimiter)) {
      if (hasDecimalComma(cell)) comma++;
      else if (hasDecimalPoint(cell)) point++;
    }
  }
  return comma > point ? ',' : '.';
}

function sampleLines(text: string): string[] {
  const out: string[] = [];
  // Only the head of the file is looked at; splitting all of it would cost as much as parsing.
  for (const line of text.slice(0, 64 * 1024).split('\n', SAMPLE_LINES * 4)) {
    if (line.trim() !== '') out.push(line);
    if (out.length === SAMPLE_LINES) break;
  }
  return out;
}

function mode(values: number[]): number {
  const tally = new Map<number, number>();
  let best = 0;
  let bestCount = 0;
  for (const v of values) {
    const c = (tally.get(v) ?? 0) + 1;
    tally.set(v, c);
    if (c > bestCount || (c === bestCount && v > best)) {
      best = v;
      bestCount = c;
    }
  }
  return best;
}
