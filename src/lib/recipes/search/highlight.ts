/** A run of text, marked when it is (the start of) a matched word. */
export interface TextSegment {
  text: string;
  mark: boolean;
}

/** Highlighting and excerpts for one set of matched terms; build once, use on every hit that shares them. */
export interface TermMatcher {
  /** Splits text into segments, marking each whole word equal to a term (any case). */
  highlight(text: string): TextSegment[];
  /**
   * About `width` characters of text around the first word that starts with a term, cut at word
   * boundaries, with an ellipsis where it was cut; the opening of the text when nothing matches.
   */
  excerpt(text: string, width?: number): string;
}

/** A letter or digit at the end (or start) of a string: what makes a match part of a longer word. */
const WORD_CHAR_BEFORE = /[\p{L}\p{N}]$/u;
const WORD_CHAR_AFTER = /^[\p{L}\p{N}]/u;

/**
 * Compiles the terms into one case-insensitive pattern, so each text is scanned once for all
 * terms, with no lower-cased copy of a long body and no match object per ordinary word. Word
 * boundaries are checked beside each match rather than in the pattern: a Unicode letter class
 * inside a pattern costs about half a millisecond to compile, more than all the scanning.
 */
export function termMatcher(terms: string[]): TermMatcher {
  const words = terms.filter(Boolean);
  if (!words.length) return { highlight: (text) => (text ? [{ text, mark: false }] : []), excerpt: (text, width) => cut(text, 0, width) };
  // Longest first, so "tanker" is tried before "tank" where both start.
  const pattern = new RegExp(words.toSorted((a, b) => b.length - a.length).map(escapeRegExp).join('|'), 'giu');

  /** Each match of a term that starts a word (and, when `whole`, also ends one), in order. */
  function* matches(text: string, whole: boolean): Generator<{ index: number; text: string }> {
    pattern.lastIndex = 0;
    for (let m = pattern.exec(text); m; m = pattern.exec(text)) {
      const end = m.index + m[0].length;
      const starts = !WORD_CHAR_BEFORE.test(text.slice(Math.max(0, m.index - 2), m.index));
      if (starts && (!whole || !WORD_CHAR_AFTER.test(text.slice(end, end + 2)))) {
        yield { index: m.index, text: m[0] };
      } else {
        pattern.lastIndex = m.index + 1;
      }
    }
  }

  return {
    highlight(text) {
      const segments: TextSegment[] = [];
      let last = 0;
      for (const m of matches(text, true)) {
        if (m.index > last) segments.push({ text: text.slice(last, m.index), mark: false });
        segments.push({ text: m.text, mark: true });
        last = m.index + m.text.length;
      }
      if (last < text.length) segments.push({ text: text.slice(last), mark: false });
      return segments;
    },
    excerpt(text, width) {
      const first = matches(text, false).next();
      return cut(text, first.done ? 0 : first.value.index, width);
    },
  };
}

/** Splits text into segments, marking each word that is one of the matched terms (any case). */
export function highlight(text: string, terms: string[]): TextSegment[] {
  return termMatcher(terms).highlight(text);
}

/** About `width` characters of text around the first matched word (see `TermMatcher.excerpt`). */
export function excerpt(text: string, terms: string[], width = 200): string {
  return termMatcher(terms).excerpt(text, width);
}

function cut(text: string, at: number, width = 200): string {
  let start = Math.max(0, at - Math.floor(width / 3));
  if (start > 0) start = text.indexOf(' ', start) + 1 || start;
  let end = Math.min(text.length, start + width);
  if (end < text.length) end = text.lastIndexOf(' ', end) > start ? text.lastIndexOf(' ', end) : end;
  return `${start > 0 ? '… ' : ''}${text.slice(start, end).trim()}${end < text.length ? ' …' : ''}`;
}

function escapeRegExp(s: string): string {
  return s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
