/**
 * How query words meet indexed words: the tokenizer both sides share, prefix and typo rules,
 * and the field boosts.
 */

/** Field boosts: a word in the title or a loop tag says more than one in the body. */
export const BOOST = { title: 4, loopTags: 3, tags: 2, summary: 1.5, body: 1 };

/**
 * The most typos (Levenshtein edits) forgiven in a query word: none in words under five letters
 * or with digits (loop tags, numbers), one in words of five to eight letters, two in longer
 * ones. The search forgives them only step by step, for the words that found nothing with fewer
 * (see `createSearchIndex`): a one-edit walk of the term tree costs about as much as the rest of
 * a query, a two-edit walk 20–60 times more, and on a word that matched as written they mostly
 * add noise ("suction" would also find every "section").
 */
export function maxEdits(term: string): number {
  if (term.length < 5 || /\d/.test(term)) return 0;
  return term.length <= 8 ? 1 : 2;
}

/** The start of a word is enough from three letters on. */
export function prefixing(term: string): boolean {
  return term.length >= 3;
}

/** An ISA-5.1 loop tag such as TIC-210 or FIC-101A: kept as one word. */
const LOOP_TAG = /^[a-z]{2,5}-?\d{2,5}[a-z]?$/i;
const SPACE_OR_PUNCTUATION = /[\n\r\p{Z}\p{P}]+/u;

/**
 * Words as MiniSearch's default splits them, except loop tags, which stay whole in documents and
 * queries alike ("TIC-210" is one word, also found as "tic210"), so "TIC" never finds "FIC-101"
 * and a tag query does not match every recipe that mentions any TIC.
 */
export function tokenize(text: string): string[] {
  return text.split(/\s+/).flatMap((chunk) => {
    const bare = chunk.replace(/^[^\p{L}\p{N}]+|[^\p{L}\p{N}]+$/gu, '');
    if (LOOP_TAG.test(bare)) return bare.includes('-') ? [bare, bare.replace('-', '')] : [bare];
    return chunk.split(SPACE_OR_PUNCTUATION).filter(Boolean);
  });
}

/** A query's words as the index compares them: tokenized and lower-cased (MiniSearch's default term processing). */
export function queryTerms(query: string): string[] {
  return tokenize(query).map((t) => t.toLowerCase()).filter(Boolean);
}
