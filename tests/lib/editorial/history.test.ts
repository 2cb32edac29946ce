import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createRecipe } from '../../../src/lib/editorial/create';
import { saveRecipe } from '../../../src/lib/editorial/save';
import { revisionDiff, revisionHistory } from '../../../src/lib/editorial/history';
import { stopCompileWorker } from '../../../src/lib/recipes/authored-mdx/compile-isolated';
import { DRAFT, PEOPLE, testContext } from './context';

type T = Awaited<ReturnType<typeof testContext>>;

// The first compile starts the worker, which takes seconds on a busy machine.
vi.setConfig({ testTimeout: 30_000 });

describe('revisionDiff', () => {
  let t: T;
  beforeEach(async () => (t = await testContext()));
  afterEach(() => t.cleanup());
  afterAll(() => stopCompileWorker());

  it('lists revisions and shows added and removed lines between any two', async () => {
    const { slug } = await createRecipe(t.ctx, PEOPLE.author, { ...DRAFT, body: 'Line one\nLine two\n' });
    await saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 1, body: 'Line one\nLine 2, corrected\n', message: 'Fix line two' });
    await saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 2, title: 'HTST hot-water temperature, PI with filter', message: 'Title' });
    const history = await revisionHistory(t.ctx, PEOPLE.author, slug);
    expect(history.revisions.map((r) => r.message)).toEqual(['First draft', 'Fix line two', 'Title']);
    const d = await revisionDiff(t.ctx, PEOPLE.author, slug, 1, 3);
    expect(d.runs.filter((r) => r.op !== 'same')).toEqual([
      { op: 'removed', lines: ['title: "HTST hot-water temperature, PI"'] },
      { op: 'added', lines: ['title: "HTST hot-water temperature, PI with filter"'] },
      { op: 'removed', lines: ['Line two'] },
      { op: 'added', lines: ['Line 2, corrected'] },
    ]);
    expect([d.added, d.removed]).toEqual([2, 2]);
  });

  it('answers 400 for a revision that does not exist', async () => {
    const { slug } = await createRecipe(t.ctx, PEOPLE.author, DRAFT);
    await expect(revisionDiff(t.ctx, PEOPLE.author, slug, 1, 9)).rejects.toMatchObject({ status: 400, field: 'to' });
  });
});
