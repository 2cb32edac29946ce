import { describe, expect, it } from 'vitest';
import { excerpt, highlight } from '../../../../src/lib/recipes/search/highlight';

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

  it('opens the text when nothing matches', () => {
    expect(excerpt('short text', ['zzz'])).toBe('short text');
  });
});
