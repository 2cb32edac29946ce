import { describe, expect, it } from 'vitest';
import { excerpt, highlight, termMatcher } from '../../../../src/lib/recipes/search/highlight';

describe('highlight', () => {
  it('marks whole words equal to a matched term, in any case, and keeps the rest', () => {
    const segments = highlight('Steam header, steam drum.', ['steam']);
    expect(segments).toEqual([
      { text: 'Steam', mark: true },
      { text: ' header, ', mark: false },
      { text: 'steam', mark: true },
      { text: ' drum.', mark: false },
    ]);
    expect(segments.map((s) => s.text).join('')).toBe('Steam header, steam drum.');
  });

  it('does not mark a word that only contains the term', () => {
    expect(highlight('downstream', ['stream']).some((s) => s.mark)).toBe(false);
  });

  it('marks a loop tag as one word and prefers the longer of two terms that share a start', () => {
    const marked = highlight('TIC-210 trims the tanker and the tank.', ['tic-210', 'tank', 'tanker']).filter((s) => s.mark).map((s) => s.text);
    expect(marked).toEqual(['TIC-210', 'tanker', 'tank']);
  });

  it('leaves the text unmarked when there are no terms', () => {
    expect(highlight('Steam header', [])).toEqual([{ text: 'Steam header', mark: false }]);
  });
});

describe('excerpt', () => {
  it('cuts around the first matched word and marks the cuts', () => {
    const text = `${'alpha '.repeat(80)}needle ${'omega '.repeat(80)}`;
    const cut = excerpt(text, ['needle'], 100);
    expect(cut).toContain('needle');
    expect(cut.startsWith('… ')).toBe(true);
    expect(cut.endsWith(' …')).toBe(true);
    expect(cut.length).toBeLessThanOrEqual(110);
  });

  it('cuts around the earliest of several terms, in any case, where a word starts', () => {
    const text = `${'alpha '.repeat(80)}Needle ${'omega '.repeat(40)}thread ${'omega '.repeat(40)}`;
    expect(excerpt(text, ['thread', 'needl'], 100)).toMatch(/^… (alpha )+Needle omega/);
  });

  it('opens the text when nothing matches', () => {
    expect(excerpt('short text', ['zzz'])).toBe('short text');
  });
});

describe('termMatcher', () => {
  it('highlights and cuts the same way as highlight and excerpt, for every text it is given', () => {
    const matcher = termMatcher(['steam']);
    for (const text of ['Steam header, steam drum.', 'No match here.', '']) {
      expect(matcher.highlight(text)).toEqual(highlight(text, ['steam']));
      expect(matcher.excerpt(text)).toBe(excerpt(text, ['steam']));
    }
  });
});
