/** The value at a path inside parsed JSON, or undefined when the path leads nowhere. */
export function valueAt(input: unknown, path: readonly (string | number)[]): unknown {
  let here: unknown = input;
  for (const key of path) {
    if (here === null || typeof here !== 'object') return undefined;
    here = (here as Record<string | number, unknown>)[key];
  }
  return here;
}

/** A short, readable name for a JSON value in an error sentence: `the text "NaN"`, `a list`. */
export function describeValue(value: unknown): string {
  if (value === undefined) return 'nothing';
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'string') {
    const shown = value.length > 24 ? `${value.slice(0, 24)}…` : value;
    return `the text "${shown}"`;
  }
  return String(value);
}
