import MiniSearch, { type SearchResult } from 'minisearch';
import type { RecipeRecord } from '../record';
import type { RecipeStatus } from '../vocabulary';
import { termMatcher, type TermMatcher, type TextSegment } from './highlight';
import { BOOST, maxEdits, prefixing, queryTerms, tokenize } from './matching';
import { plainText } from './plain-text';

export { tokenize } from './matching';

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
    // Only what the published-only document boost needs is stored in the index: MiniSearch copies
    // stored fields into every hit, and a broad query can hit every recipe. Texts for excerpts
    // are kept beside it.
    storeFields: ['status'],
    tokenize,
    searchOptions: { boost: BOOST, prefix: prefixing, fuzzy: false, maxFuzzy: 2 },
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

  /**
   * Best first. Words match as written or by their start; a word that finds nothing that way is
   * tried again within one typo, and a long one that still finds nothing within two (see
   * `maxEdits`). Only the hits returned get a highlighted title and excerpt.
   */
  function search(query: string, options: SearchOptions = {}): SearchHit[] {
    const q = query.trim();
    if (!q) return [];
    // A document boost of 0 drops a hit before MiniSearch builds its result; a filter would run
    // after every result was built and scored.
    const boostDocument = options.includeRetired ? undefined : publishedOnly;
    const edits = new Map<string, number>();
    let results = mini.search(q, { boostDocument });
    for (const level of [1, 2]) {
      const widen = unmatchedTerms(q, results).filter((t) => maxEdits(t) >= level);
      if (!widen.length) break;
      for (const t of widen) edits.set(t, level);
      results = mini.search(q, { boostDocument, fuzzy: (t) => edits.get(t) ?? false });
    }
    // Hits mostly share their matched terms: compile each set of terms once per search.
    const matchers = new Map<string, TermMatcher>();
    return results.slice(0, options.limit ?? 50).map((r) => {
      const doc = texts.get(String(r.id))!;
      const key = r.terms.join(' ');
      const matcher = matchers.get(key) ?? matchers.set(key, termMatcher(r.terms)).get(key)!;
      const inSummary = r.terms.some((t) => r.match[t]?.includes('summary'));
      const source = inSummary || !r.terms.some((t) => r.match[t]?.includes('body')) ? doc.summary : doc.body;
      return {
        slug: doc.id,
        title: doc.title,
        score: r.score,
        status: doc.status,
        loopType: doc.loopType,
        titleSegments: matcher.highlight(doc.title),
        excerptSegments: matcher.highlight(matcher.excerpt(source)),
      };
    });
  }

  for (const r of records) addOrReplace(r);
  return { addOrReplace, remove, search, get size() { return mini.documentCount; } };
}

function publishedOnly(_id: unknown, _term: string, stored?: Record<string, unknown>): number {
  return stored?.status === 'published' ? 1 : 0;
}

/** The query's words that no hit matched (stops looking once every word has matched). */
function unmatchedTerms(query: string, results: SearchResult[]): string[] {
  const missing = new Set(queryTerms(query));
  for (const r of results) {
    for (const t of r.queryTerms) missing.delete(t);
    if (!missing.size) break;
  }
  return [...missing];
}

export type SearchIndex = ReturnType<typeof createSearchIndex>;
