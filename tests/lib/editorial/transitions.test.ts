import { afterAll, beforeEach, afterEach, describe, expect, it, vi } from 'vitest';
import { createRecipe } from '../../../src/lib/editorial/create';
import { transitionRecipe } from '../../../src/lib/editorial/transitions';
import { EditorialError } from '../../../src/lib/editorial/errors';
import type { Transition } from '../../../src/lib/editorial/status';
import { stopCompileWorker } from '../../../src/lib/recipes/authored-mdx/compile-isolated';
import { DRAFT, PEOPLE, testContext } from './context';

type T = Awaited<ReturnType<typeof testContext>>;
const PATH_TO: Record<string, Transition[]> = {
  draft: [],
  in_review: ['submit'],
  published: ['submit', 'publish'],
  retired: ['submit', 'publish', 'retire'],
};
const ACTOR: Record<Transition, keyof typeof PEOPLE> = { submit: 'author', publish: 'curator', return: 'curator', retire: 'curator' };
const INPUT = { comment: 'Add the valve size.', reason: 'Replaced by the cascade recipe.' };
/** The state machine of the editorial flow, every (status, action) pair: the contract's table. */
const TABLE: { from: string; action: Transition; to: string | null }[] = [
  { from: 'draft', action: 'submit', to: 'in_review' },
  { from: 'draft', action: 'publish', to: null },
  { from: 'draft', action: 'return', to: null },
  { from: 'draft', action: 'retire', to: null },
  { from: 'in_review', action: 'submit', to: null },
  { from: 'in_review', action: 'publish', to: 'published' },
  { from: 'in_review', action: 'return', to: 'draft' },
  { from: 'in_review', action: 'retire', to: null },
  { from: 'published', action: 'submit', to: null },
  { from: 'published', action: 'publish', to: null },
  { from: 'published', action: 'return', to: null },
  { from: 'published', action: 'retire', to: 'retired' },
  { from: 'retired', action: 'submit', to: null },
  { from: 'retired', action: 'publish', to: null },
  { from: 'retired', action: 'return', to: null },
  { from: 'retired', action: 'retire', to: null },
];

// The first compile starts the worker, which takes seconds on a busy machine.
vi.setConfig({ testTimeout: 30_000 });

describe('transitionRecipe', () => {
  let t: T;
  let slug: string;
  beforeEach(async () => {
    t = await testContext();
    slug = (await createRecipe(t.ctx, PEOPLE.author, DRAFT)).slug;
  });
  afterEach(() => t.cleanup());
  afterAll(() => stopCompileWorker());

  it.each(TABLE)('$action from $from → $to', async ({ from, action, to }) => {
    for (const step of PATH_TO[from]) await transitionRecipe(t.ctx, PEOPLE[ACTOR[step]], slug, step, INPUT);
    const attempt = transitionRecipe(t.ctx, PEOPLE[ACTOR[action]], slug, action, INPUT);
    if (to) {
      expect((await attempt).status).toBe(to);
      const last = await t.knex('audit_log').orderBy('id', 'desc').first();
      expect(last).toMatchObject({ action, from_status: from, to_status: to, actor_email: PEOPLE[ACTOR[action]].email });
    } else {
      await expect(attempt).rejects.toMatchObject({ status: 409, code: 'invalid_transition' });
      expect((await t.knex('recipes').first()).status).toBe(from);
    }
  });

  it('lets only the owner submit, and only curators publish, return and retire', async () => {
    await expect(transitionRecipe(t.ctx, PEOPLE.curator, slug, 'submit')).rejects.toMatchObject({ status: 403 });
    await transitionRecipe(t.ctx, PEOPLE.author, slug, 'submit');
    await expect(transitionRecipe(t.ctx, PEOPLE.author, slug, 'publish')).rejects.toMatchObject({ status: 403 });
    await expect(transitionRecipe(t.ctx, PEOPLE.reader, slug, 'return', INPUT)).rejects.toMatchObject({ status: 403 });
    expect((await transitionRecipe(t.ctx, PEOPLE.admin, slug, 'publish')).status).toBe('published');
  });

  it('records the review date, tells the search index on publish and retire, and mails the owner', async () => {
    await transitionRecipe(t.ctx, PEOPLE.author, slug, 'submit');
    const published = await transitionRecipe(t.ctx, PEOPLE.curator, slug, 'publish');
    expect(published.reviewedAt).toMatch(/^2026-11-02T/);
    const retired = await transitionRecipe(t.ctx, PEOPLE.curator, slug, 'retire', { reason: 'Valve replaced; see the new recipe.', supersededBy: 'raw-milk-transfer-flow' });
    expect(retired).toMatchObject({ status: 'retired', retiredReason: 'Valve replaced; see the new recipe.', supersededBy: 'raw-milk-transfer-flow' });
    expect(t.indexed).toEqual([slug, slug]);
    expect(t.mail.map((m) => [m.to, m.subject])).toEqual([
      [PEOPLE.author.email, `Published: ${DRAFT.title}`],
      [PEOPLE.author.email, `Retired: ${DRAFT.title}`],
    ]);
  });

  it('sends a draft to review only with what every recipe page shows (model, controller, area, a loop tag)', async () => {
    const bare = await createRecipe(t.ctx, PEOPLE.author, { title: DRAFT.title, summary: DRAFT.summary, loopType: 'temperature', body: DRAFT.body });
    await expect(transitionRecipe(t.ctx, PEOPLE.author, bare.slug, 'submit')).rejects.toMatchObject({ status: 400, code: 'invalid_request', field: 'model' });
    expect((await t.knex('recipes').where({ slug: bare.slug }).first()).status).toBe('draft');
  });

  it('refuses a successor that does not exist or is the recipe itself', async () => {
    for (const step of PATH_TO.published) await transitionRecipe(t.ctx, PEOPLE[ACTOR[step]], slug, step);
    for (const supersededBy of ['no-such-recipe', slug]) {
      const err = await transitionRecipe(t.ctx, PEOPLE.curator, slug, 'retire', { reason: 'Old', supersededBy }).catch((e: EditorialError) => e);
      expect(err).toMatchObject({ status: 400, code: 'invalid_request', field: 'supersededBy' });
    }
  });
});
