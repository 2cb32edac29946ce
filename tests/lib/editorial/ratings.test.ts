import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createRecipe } from '../../../src/lib/editorial/create';
import { fieldNotes, rateRecipe } from '../../../src/lib/editorial/ratings';
import { setWatching } from '../../../src/lib/editorial/watching';
import { stopCompileWorker } from '../../../src/lib/recipes/authored-mdx/compile-isolated';
import { DRAFT, PEOPLE, testContext } from './context';

type T = Awaited<ReturnType<typeof testContext>>;

// The first compile starts the worker, which takes seconds on a busy machine.
vi.setConfig({ testTimeout: 30_000 });

describe('rateRecipe', () => {
  let t: T;
  beforeEach(async () => (t = await testContext()));
  afterEach(() => t.cleanup());
  afterAll(() => stopCompileWorker());

  it('keeps one rating per person, a second call replacing the first; the average is over people', async () => {
    const slug = 'raw-milk-transfer-flow';
    await rateRecipe(t.ctx, PEOPLE.reader, slug, { stars: 2 });
    await rateRecipe(t.ctx, PEOPLE.reader, slug, { stars: 4, note: 'Used on FIC-101; ti 20 % longer because the valve sticks.' });
    const r = await rateRecipe(t.ctx, PEOPLE.curator, slug, { stars: 5 });
    expect(r.rating).toEqual({ average: 4.5, count: 2 });
    const notes = await fieldNotes(t.ctx, PEOPLE.author, slug);
    expect(notes.notes).toEqual([expect.objectContaining({ name: PEOPLE.reader.name, stars: 4, note: 'Used on FIC-101; ti 20 % longer because the valve sticks.' })]);
  });

  it('mails watchers about a new field note, not the person who wrote it', async () => {
    const slug = 'raw-milk-transfer-flow';
    await setWatching(t.ctx, PEOPLE.author, slug, true);
    await setWatching(t.ctx, PEOPLE.reader, slug, true);
    await rateRecipe(t.ctx, PEOPLE.reader, slug, { stars: 3, note: 'Oscillates at low flow on FIC-102.' });
    expect(t.mail.map((m) => m.to)).toEqual([PEOPLE.author.email]);
    expect(t.mail[0].text).toContain('Oscillates at low flow on FIC-102.');
  });

  it('does not let anyone rate a draft they cannot see', async () => {
    const { slug } = await createRecipe(t.ctx, PEOPLE.author, DRAFT);
    await expect(rateRecipe(t.ctx, PEOPLE.reader, slug, { stars: 5 })).rejects.toMatchObject({ status: 404 });
    await expect(rateRecipe(t.ctx, PEOPLE.reader, 'no-such-recipe', { stars: 5 })).rejects.toMatchObject({ status: 404 });
  });
});
