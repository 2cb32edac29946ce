import { describe, expect, it } from 'vitest';
import { maxEdits, prefixing, queryTerms, tokenize } from '../../../../src/lib/recipes/search/matching';

describe('tokenize', () => {
  it('keeps loop tags whole (with and without the hyphen) and splits other words at punctuation', () => {
    expect(tokenize('Use TIC-210, then hot-water (FIC-101A).')).toEqual(['Use', 'TIC-210', 'TIC210', 'then', 'hot', 'water', 'FIC-101A', 'FIC101A']);
  });
});

describe('queryTerms', () => {
  it('gives the words lower-cased, as the index compares them', () => {
    expect(queryTerms('Pasteurizer  TIC-210')).toEqual(['pasteurizer', 'tic-210', 'tic210']);
  });
});

describe('maxEdits', () => {
  // Product rule, written down in matching.ts (no outside reference: how many typos to forgive is a choice).
  const rows: [term: string, edits: number][] = [
    ['tank', 0],
    ['valve', 1],
    ['deadband', 1],
    ['regulator', 2],
    ['neutralisation', 2],
    ['tic210', 0],
    ['lic-120', 0],
  ];
  it.each(rows)('forgives %s at most %i edits', (term, edits) => {
    expect(maxEdits(term)).toBe(edits);
  });
});

describe('prefixing', () => {
  it('matches by the start of a word from three letters on', () => {
    expect([prefixing('ho'), prefixing('hot')]).toEqual([false, true]);
  });
});
