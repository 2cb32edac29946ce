import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { z } from 'zod';
import { decodeState, encodeState, readState, stateParam, writeState } from '../../../src/lib/calculators/url-state';
import { BlockSchema } from '../../../src/lib/schemas/block';

const LoopState = z.object({ k: z.number(), tau: z.number().positive(), theta: z.number().min(0), label: z.string() });

describe('encodeState / decodeState', () => {
  it('round-trips any JSON-representable state exactly, every digit kept (property test)', () => {
    fc.assert(
      fc.property(
        fc.record({
          k: fc.double({ noNaN: true, noDefaultInfinity: true }),
          tau: fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
          theta: fc.double({ min: 0, max: 1e4, noNaN: true }),
          label: fc.string({ unit: 'grapheme' }),
        }),
        (state) => {
          const token = encodeState(state);
          expect(token).toMatch(/^[A-Za-z0-9_-]*$/);
          const back = decodeState(token, LoopState);
          // JSON writes −0 as 0; everything else must come back bit for bit.
          expect(back).toEqual({ ...state, k: Object.is(state.k, -0) ? 0 : state.k });
        },
      ),
    );
  });

  it('round-trips a block chain through the block schema', () => {
    const blocks = [
      { kind: 'gain', k: 0.8, label: 'Steam valve FV-310' },
      { kind: 'first-order', k: 1.2, tau: 45 },
      { kind: 'dead-time', theta: 6 },
      { kind: 'custom', num: [2, 1], den: [10, 7, 1] },
    ];
    expect(decodeState(encodeState(blocks), z.array(BlockSchema))).toEqual(blocks);
  });

  it('answers null for a garbled, truncated or schema-breaking token instead of throwing', () => {
    const good = encodeState({ k: 1, tau: 2, theta: 0, label: 'x' });
    expect(decodeState(good.slice(0, 7), LoopState)).toBeNull();
    expect(decodeState('%%%', LoopState)).toBeNull();
    expect(decodeState(encodeState({ k: 1, tau: -2, theta: 0, label: 'x' }), LoopState)).toBeNull();
    expect(decodeState(encodeState('just text'), LoopState)).toBeNull();
    expect(decodeState(null, LoopState)).toBeNull();
  });
});

describe('writeState / readState', () => {
  it('writes one parameter per island and keeps the others and the fragment', () => {
    const a = { k: 2, tau: 30, theta: 4, label: 'TIC-210' };
    const b = { k: -0.5, tau: 8, theta: 0, label: 'LIC-101' };
    let href = writeState('/recipes/htst?view=print#tuning', 'htst-loop', a);
    href = writeState(href, 'silo-level', b);
    const url = new URL(href, 'http://x.invalid');
    expect(url.pathname).toBe('/recipes/htst');
    expect(url.searchParams.get('view')).toBe('print');
    expect(url.hash).toBe('#tuning');
    expect(readState(url.search, 'htst-loop', LoopState)).toEqual(a);
    expect(readState(url.search, 'silo-level', LoopState)).toEqual(b);
  });

  it('keeps the origin of an absolute address and removes the parameter for null', () => {
    const href = writeState('http://127.0.0.1:4403/calculators', 'pid', { k: 1, tau: 1, theta: 1, label: '' });
    expect(href.startsWith('http://127.0.0.1:4403/calculators?pid=')).toBe(true);
    expect(writeState(href, 'pid', null)).toBe('http://127.0.0.1:4403/calculators');
  });

  it('refuses an id that would need escaping in a query string', () => {
    expect(() => stateParam('loop response')).toThrow(/letters, digits or dashes/);
    expect(stateParam('tic-210')).toBe('tic-210');
  });
});
