import { describe, expect, it } from 'vitest';
import { parseRecipeQuery, selectRecipes } from '../../../src/lib/recipes/query';
import { createSearchIndex } from '../../../src/lib/recipes/search/index';
import { makeRecord } from './make-record';

const records = [
  makeRecord('b-flow', { title: 'B flow', loopType: 'flow', area: 'silos', reviewed: '2026-03-01' }),
  makeRecord('a-level', { title: 'A level', loopType: 'level', area: 'htst', reviewed: '2026-05-01' }, 'averaging'),
  makeRecord('c-old', { title: 'C old level', loopType: 'level', status: 'retired', retiredReason: 'Replaced.' }),
  makeRecord('d-draft', { title: 'D draft averaging', status: 'draft', owner: { name: 'Ann', email: 'ann@brindlewood.example' } }),
];
const ratings = new Map([
  ['b-flow', { average: 4.5, count: 2 }],
  ['a-level', { average: 3, count: 1 }],
]);
const context = { index: createSearchIndex(records), ratings };
const slugs = (query: Record<string, string>, viewer: { email: string; role: string } | null = null) => {
  const parsed = parseRecipeQuery(new URLSearchParams(query));
  if (!parsed.success) throw parsed.error;
  return selectRecipes(records, parsed.data, viewer, context).map((r) => r.slug);
};

const cases: { query: Record<string, string>; expected: string[]; what: string }[] = [
  { query: {}, expected: ['a-level', 'b-flow'], what: 'published only, by title' },
  { query: { status: 'retired' }, expected: ['c-old'], what: 'retired on request' },
  { query: { loopType: 'level' }, expected: ['a-level'], what: 'one loop type' },
  { query: { area: 'silos' }, expected: ['b-flow'], what: 'one area' },
  { query: { minRating: '4' }, expected: ['b-flow'], what: 'rated at least 4 stars' },
  { query: { sort: 'reviewed' }, expected: ['a-level', 'b-flow'], what: 'newest review first' },
  { query: { sort: 'rating' }, expected: ['b-flow', 'a-level'], what: 'best rated first' },
  { query: { q: 'averaging' }, expected: ['a-level'], what: 'words through the search index' },
  { query: { status: 'draft' }, expected: [], what: 'no drafts for a reader who is not the owner' },
];

describe('selectRecipes', () => {
  it.each(cases)('$what', ({ query, expected }) => {
    expect(slugs(query, { email: 'reader@brindlewood.example', role: 'reader' })).toEqual(expected);
  });

  it('shows a draft to its owner and to a curator, matching words on title and summary', () => {
    expect(slugs({ status: 'draft', q: 'averaging' }, { email: 'ann@brindlewood.example', role: 'author' })).toEqual(['d-draft']);
    expect(slugs({ status: 'draft' }, { email: 'cur@brindlewood.example', role: 'curator' })).toEqual(['d-draft']);
  });
});

describe('parseRecipeQuery', () => {
  it('treats empty values as absent and refuses unknown ones with the field named', () => {
    expect(parseRecipeQuery(new URLSearchParams('loopType=&status=')).success).toBe(true);
    const bad = parseRecipeQuery(new URLSearchParams('minRating=9'));
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0].path).toEqual(['minRating']);
  });
});
