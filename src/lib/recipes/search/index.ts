import MiniSearch from 'minisearch';
import type { RecipeRecord } from '../record';
import type { RecipeStatus } from '../vocabulary';
import { excerpt, highlight, type TextSegment } from './highlight';
import { plainText } from './plain-text';

/** What the index holds per recipe. */
interface SearchDocument {
  id: string;
  title: string;
  summary: string;
  tags: string;
  loopTags: string;
  body: string;
  status: RecipeStatus;
  loopType: string;
}

/** One search hit, best first, with highlighted title and excerpt. */
export interface SearchHit {
  slug: string;
  title: string;
  score: number;
  status: RecipeStatus;
  loopType: string;
  titleSegments: TextSegment[];
  excerptSegments: TextSegment[];
}

export interface SearchOptions {
  /** Include retired recipes (default: published only). */
  includeRetired?: boolean;
  /** At most this many hits (default 50). */
  limit?: number;
}

/** Statuses the index holds: readers search published recipes, and retired ones on request. */
const SEARCHABLE = new Set<RecipeStatus>(['published', 'retired']);

/** Field boosts: a word in the title or a loop tag says more than one in the body. */
const BOOST = { title: 4, loopTags: 3, tags: 2, summary: 1.5, body: 1 };

/**
 * Typos forgiven: one edit in words of five to eight letters, two in longer ones; shorter words
 * and loop tags must match (a wider net costs time on a large index and finds noise).
 */
function fuzziness(term: string): number | false {
  if (term.length < 5 || /\d/.test(term)) return false;
  return term.length <= 8 ? 1 : 2;
}

/** The start of a word is enough from three letters on. */
function prefixing(term: string): boolean {
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

function toDocument(r: RecipeRecord): SearchDocument {
  const d = r.data;
  return {
    id: r.slug,
    title: d.title,
    summary: d.summary,
    tags: d.tags.join(' '),
    loopTags: [...d.loopTags, ...(d.innerLoop ? [d.innerLoop.loopTag] : [])].join(' '),
    body: plainText(r.body),
    status: d.status,
    loopType: d.loopType,
  };
}

/** A MiniSearch index over the recipes that readers may find; updatable one recipe at a time. */
export function createSearchIndex(records: RecipeRecord[] = []) {
  const mini = new MiniSearch<SearchDocument>({
    fields: ['title', 'summary', 'tags', 'loopTags', 'body'],
    // Only what the filter needs is stored in the index: MiniSearch copies stored fields into
    // every hit, and a broad query can hit every recipe. Texts for excerpts are kept beside it.
    storeFields: ['status'],
    tokenize,
    searchOptions: { boost: BOOST, prefix: prefixing, fuzzy: fuzziness, maxFuzzy: 2 },
  });

  /** Puts a recipe in the index, replacing its older version; drafts and recipes in review leave it. */
  const texts = new Map<string, SearchDocument>();

  function addOrReplace(record: RecipeRecord): void {
    remove(record.slug);
    if (!SEARCHABLE.has(record.data.status)) return;
    const doc = toDocument(record);
    mini.add(doc);
    texts.set(doc.id, doc);
  }

  /** Takes a recipe out of the index; no-op when it is not there. */
  function remove(slug: string): void {
    if (mini.has(slug)) mini.discard(slug);
    texts.delete(slug);
  }

  function search(query: string, options: SearchOptions = {}): SearchHit[] {
    const q = query.trim();
    if (!q) return [];
    const allowRetired = options.includeRetired ?? false;
    const results = mini.search(q, { filter: (r) => r.status === 'published' || (allowRetired && r.status === 'retired') });
    return results.slice(0, options.limit ?? 50).map((r) => {
      const doc = texts.get(String(r.id))!;
      const inSummary = r.terms.some((t) => r.match[t]?.includes('summary'));
      const source = inSummary || !r.terms.some((t) => r.match[t]?.includes('body')) ? doc.summary : doc.body;
      return {
        slug: doc.id,
        title: doc.title,
        score: r.score,
        status: doc.status,
        loopType: doc.loopType,
        titleSegments: highlight(doc.title, r.terms),
        excerptSegments: highlight(excerpt(source, r.terms), r.terms),
      };
    });
  }

  for (const r of records) addOrReplace(r);
  return { addOrReplace, remove, search, get size() { return mini.documentCount; } };
}

export type SearchIndex = ReturnType<typeof createSearchIndex>;
