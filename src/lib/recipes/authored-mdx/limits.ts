import { problemAt, type BodyProblem } from './problem';

/** Limits that keep one body from stalling the parser (it is pathologically slow on some input). */
export const BODY_LIMITS = {
  /** Largest body accepted, in bytes of UTF-8. */
  maxBytes: 64 * 1024,
  /** Deepest leading indentation of a line, in columns (a tab counts 4). */
  maxIndent: 48,
  /** Most container markers (`>`, `-`, `*`, `+`, `1.`) opening one line. */
  maxContainerMarkers: 10,
  /** Most emphasis delimiters (`*`, `_`) in the whole body. */
  maxEmphasisMarkers: 3000,
  /** Most square brackets in the whole body. */
  maxBrackets: 3000,
  /** Wall-clock budget for compiling one body in the worker, ms. */
  compileTimeoutMs: 4000,
} as const;

const CONTAINER_PREFIX = /^(?:[ \t]*(?:>|[-*+](?=[ \t])|\d{1,9}[.)](?=[ \t])))+/;

/** Cheap checks before parsing: size, indentation and marker counts. Null when the body may go on. */
export function precheckBody(body: string, limits = BODY_LIMITS): BodyProblem | null {
  const bytes = Buffer.byteLength(body, 'utf8');
  if (bytes > limits.maxBytes) {
    return problemAt(null, `The body is ${Math.ceil(bytes / 1024)} KB; the limit is ${limits.maxBytes / 1024} KB — split it into two recipes or shorten it.`);
  }
  if (body.includes('\u0000')) return problemAt(locate(body, body.indexOf('\u0000')), 'The body contains a NUL character; remove it.');
  const lines = body.split('\n');
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    const indent = indentWidth(line);
    if (indent > limits.maxIndent) {
      return problemAt({ line: i + 1, column: 1 }, `This line is indented ${indent} columns; at most ${limits.maxIndent} are allowed.`);
    }
    const prefix = CONTAINER_PREFIX.exec(line)?.[0] ?? '';
    const markers = (prefix.match(/>|[-*+]|\d{1,9}[.)]/g) ?? []).length;
    if (markers > limits.maxContainerMarkers) {
      return problemAt({ line: i + 1, column: 1 }, `This line nests ${markers} lists or quotes; at most ${limits.maxContainerMarkers} are allowed.`);
    }
  }
  const emphasis = countOf(body, /[*_]/g);
  if (emphasis > limits.maxEmphasisMarkers) {
    return problemAt(null, `The body has ${emphasis} emphasis markers (* or _); at most ${limits.maxEmphasisMarkers} are allowed — escape stray ones with a backslash.`);
  }
  const brackets = countOf(body, /[[\]]/g);
  if (brackets > limits.maxBrackets) {
    return problemAt(null, `The body has ${brackets} square brackets; at most ${limits.maxBrackets} are allowed.`);
  }
  return null;
}

function indentWidth(line: string): number {
  let width = 0;
  for (const ch of line) {
    if (ch === ' ') width += 1;
    else if (ch === '\t') width += 4;
    else break;
  }
  return width;
}

function countOf(text: string, pattern: RegExp): number {
  return text.match(pattern)?.length ?? 0;
}

function locate(text: string, index: number): { line: number; column: number } {
  const before = text.slice(0, index).split('\n');
  return { line: before.length, column: before[before.length - 1].length + 1 };
}
