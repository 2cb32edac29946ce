/** A run of text, marked when it is (the start of) a matched word. */
export interface TextSegment {
  text: string;
  mark: boolean;
}

const WORD = /[\p{L}\p{N}]+/gu;

/** Splits text into segments, marking each word that is one of the matched terms (any case). */
export function highlight(text: string, terms: string[]): TextSegment[] {
  const lower = new Set(terms.map((t) => t.toLowerCase()));
  const segments: TextSegment[] = [];
  let last = 0;
  for (const m of text.matchAll(WORD)) {
    const word = m[0].toLowerCase();
    if (!lower.has(word)) continue;
    if (m.index > last) segments.push({ text: text.slice(last, m.index), mark: false });
    segments.push({ text: m[0], mark: true });
    last = m.index + m[0].length;
  }
  if (last < text.length) segments.push({ text: text.slice(last), mark: false });
  return segments;
}

/**
 * About `width` characters of text around the first matched word, cut at word boundaries,
 * with an ellipsis where it was cut; the opening of the text when nothing matches.
 */
export function excerpt(text: string, terms: string[], width = 200): string {
  const lower = text.toLowerCase();
  const positions = terms.map((t) => lower.search(new RegExp(`(?<![\\p{L}\\p{N}])${escapeRegExp(t.toLowerCase())}`, 'u'))).filter((i) => i >= 0);
  const at = positions.length ? Math.min(...positions) : 0;
  let start = Math.max(0, at - Math.floor(width / 3));
  if (start > 0) start = text.indexOf(' ', start) + 1 || start;
  let end = Math.min(text.length, start + width);
  if (end < text.length) end = text.lastIndexOf(' ', end) > start ? text.lastIndexOf(' ', end) : end;
  return `${start > 0 ? '… ' : ''}${text.slice(start, end).trim()}${end < text.length ? ' …' : ''}`;
}

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
