import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createRecipe } from '../../../src/lib/editorial/create';
import { saveRecipe } from '../../../src/lib/editorial/save';
import { EditorialError } from '../../../src/lib/editorial/errors';
import { authoredRecords } from '../../../src/lib/editorial/records';
import { reload } from '../../../src/lib/editorial/load';
import { UpdateRecipeSchema } from '../../../src/lib/editorial/fields';
import { stopCompileWorker } from '../../../src/lib/recipes/authored-mdx/compile-isolated';
import { DRAFT, PEOPLE, testContext } from './context';

type T = Awaited<ReturnType<typeof testContext>>;

// The first save starts the compile worker, which takes seconds on a busy machine.
vi.setConfig({ testTimeout: 30_000 });
afterAll(() => stopCompileWorker());

async function refusal(p: Promise<unknown>): Promise<EditorialError> {
  try {
    await p;
  } catch (err) {
    if (err instanceof EditorialError) return err;
    throw err;
  }
  throw new Error('expected a refusal');
}

describe('createRecipe', () => {
  let t: T;
  beforeEach(async () => (t = await testContext()));
  afterEach(() => t.cleanup());

  it('creates a draft at revision 1 with a slug from the title, its compiled body and an audit entry', async () => {
    const recipe = await createRecipe(t.ctx, PEOPLE.author, DRAFT);
    expect(recipe).toMatchObject({ slug: 'htst-hot-water-temperature-pi', status: 'draft', revision: 1, ownerEmail: PEOPLE.author.email, source: 'authored', url: '/recipes/htst-hot-water-temperature-pi', rating: { average: null, count: 0 } });
    expect(recipe.html).toContain('data-island="LoopResponse"');
    expect(await t.knex('audit_log').select('action', 'to_status')).toEqual([{ action: 'create', to_status: 'draft' }]);
  });

  it('keeps slugs unique, also against file recipes', async () => {
    const a = await createRecipe(t.ctx, PEOPLE.author, DRAFT);
    const b = await createRecipe(t.ctx, PEOPLE.author, DRAFT);
    const c = await createRecipe(t.ctx, PEOPLE.author, { ...DRAFT, title: 'Raw-milk transfer flow' });
    expect([a.slug, b.slug, c.slug]).toEqual(['htst-hot-water-temperature-pi', 'htst-hot-water-temperature-pi-2', 'raw-milk-transfer-flow-2']);
  });

  it('refuses a body that is not allowed with the line, and writes nothing', async () => {
    const err = await refusal(createRecipe(t.ctx, PEOPLE.author, { ...DRAFT, body: '# Title\n\nok\n\n<script>alert(1)</script>' }));
    expect(err).toMatchObject({ status: 400, code: 'invalid_body' });
    expect(err.message).toMatch(/^Line 5, column 1:/);
    expect(await t.knex('recipes').count({ n: '*' })).toEqual([{ n: 0 }]);
    expect(await t.knex('recipe_revisions').count({ n: '*' })).toEqual([{ n: 0 }]);
  });

  it('lets only authors and above create', async () => {
    expect(await refusal(createRecipe(t.ctx, PEOPLE.reader, DRAFT))).toMatchObject({ status: 403, code: 'forbidden' });
  });
});

describe('saveRecipe', () => {
  let t: T;
  let slug: string;
  beforeEach(async () => {
    t = await testContext();
    slug = (await createRecipe(t.ctx, PEOPLE.author, DRAFT)).slug;
  });
  afterEach(() => t.cleanup());

  it('stores every save as a new revision with who and the message', async () => {
    const saved = await saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 1, summary: 'Holds the HTST hot-water set; PI tuned from the March bump test.', message: 'Summary from field test' });
    expect(saved).toMatchObject({ revision: 2, summary: 'Holds the HTST hot-water set; PI tuned from the March bump test.', title: DRAFT.title, body: DRAFT.body });
    const revs = await t.knex('recipe_revisions').orderBy('revision').select('revision', 'author_email', 'message');
    expect(revs).toEqual([
      { revision: 1, author_email: PEOPLE.author.email, message: 'First draft' },
      { revision: 2, author_email: PEOPLE.author.email, message: 'Summary from field test' },
    ]);
  });

  it('keeps claims, sensor, tuning rule and model source through a save and a reload, and a later save of other fields', async () => {
    const loop = {
      claims: [{ metric: 'overshootPct' as const, op: '<=' as const, value: 5, input: 'setpoint' as const }, { metric: 'phaseMarginDeg' as const, op: '>=' as const, value: 45, input: 'setpoint' as const }],
      sensor: { num: [1], den: [4, 1], delay: 0 },
      tuningRule: { rule: 'simc' as const, designTime: 12, note: 'ti rounded to 45 s' },
      modelSource: 'Bump test on TIC-210, 5 % valve step, 3 March',
    };
    await saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 1, ...loop, message: 'Claims and tuning rule' });
    await saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 2, summary: 'Holds the HTST hot-water set; PI tuned by SIMC from the March bump test.' });
    expect(await reload(t.knex, slug)).toMatchObject({ revision: 3, ...loop });
    const [record] = await authoredRecords(t.knex);
    expect(record.data).toMatchObject({ tuningRule: loop.tuningRule, modelSource: loop.modelSource, claims: loop.claims, sensor: loop.sensor });
  });

  it('removes a sensor, tuning rule or model source saved as null, and keeps one left out', async () => {
    await saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 1, sensor: { num: [1], den: [4, 1], delay: 0 }, tuningRule: { rule: 'imc', designTime: 20 }, modelSource: 'Vendor sheet for TT-210' });
    await saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 2, sensor: null, tuningRule: null });
    expect(await reload(t.knex, slug)).toMatchObject({ revision: 3, sensor: null, tuningRule: null, modelSource: 'Vendor sheet for TT-210' });
    const stored = await t.knex('recipe_revisions').where({ revision: 3 }).first('frontmatter_json');
    expect(Object.keys(JSON.parse(stored.frontmatter_json))).not.toContain('tuningRule');
  });

  it('reads a draft without a tuning rule or model source as none in the API and as neutral defaults on its page', async () => {
    expect(await reload(t.knex, slug)).toMatchObject({ tuningRule: null, modelSource: null, claims: [], sensor: null });
    const [record] = await authoredRecords(t.knex);
    expect(record.data).toMatchObject({ tuningRule: { rule: 'field' }, claims: [] });
  });

  it('answers 409 conflict with the current recipe for a stale base revision, changing nothing', async () => {
    await saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 1, body: 'Mine.' });
    const err = await refusal(saveRecipe(t.ctx, PEOPLE.curator, slug, { baseRevision: 1, body: 'Theirs.' }));
    expect(err).toMatchObject({ status: 409, code: 'conflict' });
    expect(err.extra.current).toMatchObject({ revision: 2, body: 'Mine.' });
    expect(await t.knex('recipe_revisions').count({ n: '*' })).toEqual([{ n: 2 }]);
  });

  it('lets exactly one of two concurrent saves from the same revision win, and loses neither text', async () => {
    const results = await Promise.allSettled([
      saveRecipe(t.ctx, PEOPLE.author, slug, { baseRevision: 1, body: 'Text from the control room laptop.' }),
      saveRecipe(t.ctx, PEOPLE.curator, slug, { baseRevision: 1, body: 'Text from the office.' }),
    ]);
    const won = results.filter((r) => r.status === 'fulfilled');
    const lost = results.filter((r): r is PromiseRejectedResult => r.status === 'rejected');
    expect(won).toHaveLength(1);
    expect(lost).toHaveLength(1);
    expect(lost[0].reason).toMatchObject({ status: 409, code: 'conflict' });
    const current = (lost[0].reason as EditorialError).extra.current as { revision: number; body: string };
    expect(current.revision).toBe(2);
    // The loser saves again on top of the winner: both texts are kept in the history.
    const loserText = results[0].status === 'rejected' ? 'Text from the control room laptop.' : 'Text from the office.';
    await saveRecipe(t.ctx, PEOPLE.curator, slug, { baseRevision: current.revision, body: `${current.body}\n\n${loserText}` });
    const bodies = (await t.knex('recipe_revisions').orderBy('revision').select('body')).map((r) => r.body);
    expect(bodies).toHaveLength(3);
    expect(bodies[1]).toBe(current.body);
    expect(bodies[2]).toContain(loserText);
    expect(bodies[2]).toContain(current.body);
  });

  it('hides a draft from another author (404) and refuses readers (403)', async () => {
    expect(await refusal(saveRecipe(t.ctx, PEOPLE.author2, slug, { baseRevision: 1, title: 'Mine now' }))).toMatchObject({ status: 404 });
    expect(await refusal(saveRecipe(t.ctx, PEOPLE.reader, slug, { baseRevision: 1, title: 'Mine now' }))).toMatchObject({ status: 403 });
  });

  it('answers 409 read_only for a file recipe', async () => {
    expect(await refusal(saveRecipe(t.ctx, PEOPLE.curator, 'raw-milk-transfer-flow', { baseRevision: 1, title: 'Changed' }))).toMatchObject({ status: 409, code: 'read_only' });
  });
});

describe('UpdateRecipeSchema', () => {
  const refusal = (body: unknown) => {
    const r = UpdateRecipeSchema.safeParse(body);
    return r.success ? null : { field: r.error.issues[0].path.join('.'), message: r.error.issues[0].message };
  };

  it.each([
    ['a claim value that is not a number', { claims: [{ metric: 'overshootPct', op: '<=', value: 'five' }] }, 'claims.0.value'],
    ['an empty claim value', { claims: [{ metric: 'iae', op: '<=', value: 2 }, { metric: 'overshootPct', op: '<=', value: '' }] }, 'claims.1.value'],
    ['an unknown claim metric', { claims: [{ metric: 'overshoot', op: '<=', value: 5 }] }, 'claims.0.metric'],
    ['an unknown claim op', { claims: [{ metric: 'overshootPct', op: '<', value: 5 }] }, 'claims.0.op'],
    ['an unknown tuning rule', { tuningRule: { rule: 'guesswork' } }, 'tuningRule.rule'],
    ['a design time that is not positive', { tuningRule: { rule: 'lambda', designTime: 0 } }, 'tuningRule.designTime'],
    ['a model source of one letter', { modelSource: 'x' }, 'modelSource'],
    ['a sensor without a denominator', { sensor: { num: [1], den: [] } }, 'sensor.den'],
  ])('refuses %s and names the field', (_, fields, field) => {
    expect(refusal({ baseRevision: 1, ...fields })).toMatchObject({ field });
  });

  it('accepts the fields the editor sends for a complete loop', () => {
    expect(refusal({ baseRevision: 1, claims: [{ metric: 'settlingTime', op: '<=', value: 120, input: 'load' }], tuningRule: { rule: 'field' }, modelSource: 'Vendor sheet', sensor: { num: [1], den: [2, 1] } })).toBeNull();
  });
});
