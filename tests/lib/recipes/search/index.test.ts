import { describe, expect, it } from 'vitest';
import { createSearchIndex } from '../../../../src/lib/recipes/search/index';
import { makeRecord } from '../make-record';

const records = [
  makeRecord('pasteurizer-cascade', { title: 'Pasteurizer product temperature cascade', loopType: 'temperature', loopTags: ['TIC-210'], tags: ['HTST'] }, 'The hot-water loop sits inside the product loop.'),
  makeRecord('silo-level', { title: 'Silo level averaging', summary: 'Smooth outflow from the raw-milk silo.', loopType: 'level', loopTags: ['LIC-120'] }, 'Averaging control lets the level swing.'),
  makeRecord('old-level', { title: 'Silo level tight control', status: 'retired', retiredReason: 'Replaced.', supersededBy: 'silo-level', loopTags: ['LIC-121'] }),
  makeRecord('draft-flow', { title: 'Draft pasteurizer flow', status: 'draft' }),
  makeRecord('body-only', { title: 'Steam header', summary: 'Boiler house pressure.', loopTags: ['PIC-400'] }, 'Mentions the pasteurizer once, deep in the body.'),
];

describe('createSearchIndex', () => {
  it('finds a recipe by a misspelled word (fuzzy matching)', () => {
    const hits = createSearchIndex(records).search('pasturizer');
    expect(hits.map((h) => h.slug)).toContain('pasteurizer-cascade');
  });

  it('finds a long word with two typos once one typo finds nothing', () => {
    // "pastuerizer": two letters swapped, two Levenshtein edits from "pasteurizer".
    expect(createSearchIndex(records).search('pastuerizer').map((h) => h.slug)).toContain('pasteurizer-cascade');
  });

  it('finds a misspelled word beside a word spelled right', () => {
    expect(createSearchIndex(records).search('pasturizer loop')[0]?.slug).toBe('pasteurizer-cascade');
  });

  it('forgives no typo in a word that matched as written (suction does not find section)', () => {
    const index = createSearchIndex([
      makeRecord('glycol-suction', { title: 'Glycol compressor suction pressure', loopTags: ['PIC-610'] }),
      makeRecord('holding-section', { title: 'Holding section temperature', loopTags: ['TIC-220'] }),
    ]);
    expect(index.search('suction').map((h) => h.slug)).toEqual(['glycol-suction']);
    expect(index.search('suctin').map((h) => h.slug)).toEqual(['glycol-suction']);
  });

  it('finds a recipe by the start of a word (prefix matching)', () => {
    expect(createSearchIndex(records).search('averag')[0]?.slug).toBe('silo-level');
  });

  it('finds a recipe by its ISA-5.1 loop tag, written with or without the hyphen, and only by its own tag', () => {
    const index = createSearchIndex(records);
    expect(index.search('TIC-210').map((h) => h.slug)).toEqual(['pasteurizer-cascade']);
    expect(index.search('tic210').map((h) => h.slug)).toEqual(['pasteurizer-cascade']);
    expect(index.search('TIC-211')).toEqual([]);
    expect(index.search('LIC-12').map((h) => h.slug)).toEqual(['silo-level']);
  });

  it('ranks a title match above a match in the body only (field boosts)', () => {
    const slugs = createSearchIndex(records).search('pasteurizer').map((h) => h.slug);
    expect(slugs.indexOf('pasteurizer-cascade')).toBeLessThan(slugs.indexOf('body-only'));
    expect(slugs).toContain('body-only');
  });

  it('leaves retired recipes out unless asked, and never holds drafts', () => {
    const index = createSearchIndex(records);
    expect(index.search('tight').map((h) => h.slug)).not.toContain('old-level');
    expect(index.search('tight', { includeRetired: true }).map((h) => h.slug)).toContain('old-level');
    expect(index.search('draft').map((h) => h.slug)).not.toContain('draft-flow');
    expect(index.size).toBe(4);
  });

  it('marks the matched words in the title and excerpt', () => {
    const [hit] = createSearchIndex(records).search('pasturizer');
    expect(hit.titleSegments.filter((s) => s.mark).map((s) => s.text)).toEqual(['Pasteurizer']);
    const body = createSearchIndex(records).search('deep').find((h) => h.slug === 'body-only');
    expect(body?.excerptSegments.some((s) => s.mark && s.text === 'deep')).toBe(true);
  });

  it('updates one recipe at a time: addOrReplace and remove', () => {
    const index = createSearchIndex(records);
    index.addOrReplace(makeRecord('silo-level', { title: 'Silo level with a gentle filter', loopTags: ['LIC-120'] }));
    expect(index.search('gentle')[0]?.slug).toBe('silo-level');
    expect(index.search('averaging').map((h) => h.slug)).not.toContain('silo-level');
    index.addOrReplace(makeRecord('silo-level', { title: 'Silo level with a gentle filter', status: 'in_review' }));
    expect(index.search('gentle')).toEqual([]);
    index.remove('pasteurizer-cascade');
    expect(index.search('TIC-210')).toEqual([]);
    expect(() => index.remove('not-there')).not.toThrow();
  });

  it('answers an empty query with no hits', () => {
    expect(createSearchIndex(records).search('   ')).toEqual([]);
  });
});
