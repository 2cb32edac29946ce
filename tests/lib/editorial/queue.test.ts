import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createRecipe } from '../../../src/lib/editorial/create';
import { reviewQueue, staleRule } from '../../../src/lib/editorial/queue';
import { rateRecipe } from '../../../src/lib/editorial/ratings';
import { transitionRecipe } from '../../../src/lib/editorial/transitions';
import { setWatching } from '../../../src/lib/editorial/watching';
import { stopCompileWorker } from '../../../src/lib/recipes/authored-mdx/compile-isolated';
import { DRAFT, PEOPLE, testContext } from './context';

type T = Awaited<ReturnType<typeof testContext>>;

// The first compile starts the worker, which takes seconds on a busy machine.
vi.setConfig({ testTimeout: 30_000 });

describe('staleRule', () => {
  it('reads LOOPWRIGHT_STALE_DAYS and falls back to 365 days for a missing or bad value', () => {
    expect(staleRule({ LOOPWRIGHT_STALE_DAYS: '90' }).staleDays).toBe(90);
    expect(staleRule({}).staleDays).toBe(365);
    expect(staleRule({ LOOPWRIGHT_STALE_DAYS: 'soon' }).staleDays).toBe(365);
  });
});

describe('reviewQueue', () => {
  let t: T;
  beforeEach(async () => (t = await testContext()));
  afterEach(() => t.cleanup());
  afterAll(() => stopCompileWorker());

  it('lists what waits for review, and published recipes not reviewed in time or rated low', async () => {
    const waiting = await createRecipe(t.ctx, PEOPLE.author, DRAFT);
    await transitionRecipe(t.ctx, PEOPLE.author, waiting.slug, 'submit');
    const rated = await createRecipe(t.ctx, PEOPLE.author, { ...DRAFT, title: 'Balance tank level, averaging' });
    await transitionRecipe(t.ctx, PEOPLE.author, rated.slug, 'submit');
    await transitionRecipe(t.ctx, PEOPLE.curator, rated.slug, 'publish');
    await rateRecipe(t.ctx, PEOPLE.reader, rated.slug, { stars: 2 });
    await rateRecipe(t.ctx, PEOPLE.admin, rated.slug, { stars: 1 });
    const files = [
      { slug: 'old-file-recipe', title: 'Old file recipe', reviewed: '2024-05-01', status: 'published' },
      { slug: 'fresh-file-recipe', title: 'Fresh file recipe', reviewed: '2026-10-01', status: 'published' },
    ];
    const q = await reviewQueue(t.ctx, PEOPLE.curator, files, { staleDays: 365, lowRating: 3, minRatings: 2 });
    expect(q.waiting.map((w) => w.slug)).toEqual([waiting.slug]);
    expect(q.stale.map((s) => [s.slug, s.reasons])).toEqual([
      [rated.slug, ['rated 1.5 by 2 people']],
      ['old-file-recipe', ['not reviewed for over 365 days']],
    ]);
  });

  it('is for curators and admins only', async () => {
    await expect(reviewQueue(t.ctx, PEOPLE.author)).rejects.toMatchObject({ status: 403 });
  });

  it('mails watchers when a watched recipe is published and when it is retired', async () => {
    const r = await createRecipe(t.ctx, PEOPLE.author, DRAFT);
    await transitionRecipe(t.ctx, PEOPLE.author, r.slug, 'submit');
    await setWatching(t.ctx, PEOPLE.admin, r.slug, true);
    await transitionRecipe(t.ctx, PEOPLE.curator, r.slug, 'publish');
    await transitionRecipe(t.ctx, PEOPLE.curator, r.slug, 'retire', { reason: 'Replaced by the cascade recipe.' });
    const toAdmin = t.mail.filter((m) => m.to === PEOPLE.admin.email).map((m) => m.subject);
    expect(toAdmin).toEqual([`New revision published: ${DRAFT.title}`, `Retired: ${DRAFT.title}`]);
  });
});
