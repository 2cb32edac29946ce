import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { saveEvidence } from '../../../../src/lib/fielddata/service/evidence';
import { fitStepTest, uploadStepTest } from '../../../../src/lib/fielddata/service/step-tests';
import { createLoop } from '../../../../src/lib/fielddata/service/loops';
import { stepTestFolder } from '../../../../src/lib/fielddata/storage';
import { FieldDataProblem } from '../../../../src/lib/fielddata/problem';
import { seed as seedAreas } from '../../../../src/lib/db/seeds/01-plant-areas';
import { tempDatabase } from '../../../support/temp-db';
import { listCatalog } from '../../../support/recipe-catalog';
import { toCsv } from '../../../support/step-test-csv';

const actor = { email: 'ines.marlow@brindlewood.example', name: 'Ines Marlow', role: 'author' };
const tuning = { rule: 'simc', source: 'Skogestad 2003', setting: { form: 'ideal', gain: 7.1, integral: 30, derivative: null, timeUnit: 's', gainUnit: '%/°C' } };

let db: Awaited<ReturnType<typeof tempDatabase>>;
let folder: string;
let catalog: ReturnType<typeof listCatalog>;
let stepTestId: number;
let fitId: number;

beforeEach(async () => {
  db = await tempDatabase();
  await seedAreas(db.knex);
  folder = stepTestFolder(db.file);
  catalog = listCatalog([
    { slug: 'htst-hot-water', title: 'HTST hot water', loopType: 'temperature', status: 'published', url: '/recipes/htst-hot-water', model: { type: 'fopdt', k: 0.5, tau: 40, theta: 5 } },
    { slug: 'old-steam', title: 'Old steam loop', loopType: 'temperature', status: 'retired', url: '/recipes/old-steam', model: null },
  ]);
  const csv = toCsv({ model: { type: 'fopdt', k: 0.42, tau: 30, theta: 4 }, dt: 0.5, n: 300, stepAt: 20, u0: 40, u1: 45, y0: 71.8, sigma: 0.02, seed: 3 });
  const up = await uploadStepTest(db.knex, folder, actor, { bytes: new TextEncoder().encode(csv), fileName: 'tic210.csv', fields: { tag: 'TIC-210', area: 'htst' } });
  stepTestId = up.stepTest.id;
  const fitted = await fitStepTest(db.knex, folder, stepTestId, actor, { models: ['fopdt'] }, catalog);
  fitId = fitted.fits[0].id;
  expect(fitted.fits[0].matches[0].slug).toBe('htst-hot-water');
});
afterEach(async () => db.cleanup());

describe('saveEvidence', () => {
  it('attaches evidence to an existing recipe, marks the fit chosen and links the loops named', async () => {
    await createLoop(db.knex, { tag: 'TIC-210', area: 'htst', ownerEmail: 'wren@brindlewood.example' }, catalog);
    const r = await saveEvidence(db.knex, actor, { stepTestId, fitId, tuning, recipeSlug: 'htst-hot-water', loopTags: ['tic-210'], note: 'After the valve change' }, catalog);
    expect(r.createdDraft).toBe(false);
    expect(r.evidence).toMatchObject({ recipeSlug: 'htst-hot-water', stepTestId, fitId, tag: 'TIC-210', note: 'After the valve change', tuning: { rule: 'simc' } });
    expect(await db.knex('model_fits').where({ id: fitId }).first()).toMatchObject({ chosen: 1 });
    expect(await db.knex('loop_evidence').select()).toEqual([{ loop_id: 1, evidence_id: r.evidence.id }]);
  });

  it('starts a new draft recipe carrying the fitted model and the chosen tuning in seconds', async () => {
    const r = await saveEvidence(db.knex, actor, { stepTestId, fitId, tuning: { ...tuning, setting: { ...tuning.setting, integral: 0.5, timeUnit: 'min' } }, newDraft: { title: 'Booster hot-water loop', summary: 'Hot-water set on the HTST booster side.', loopType: 'temperature' } }, catalog);
    expect(r.createdDraft).toBe(true);
    expect(r.recipe.slug).toBe('booster-hot-water-loop');
    expect(catalog.drafts[0]).toMatchObject({ model: { type: 'fopdt' }, controller: { form: 'ideal', kc: 7.1, ti: 30, td: 0 } });
  });

  const refusals: { name: string; body: Record<string, unknown>; status: number; message: string }[] = [
    { name: 'a recipe that does not exist', body: { recipeSlug: 'nope' }, status: 400, message: 'There is no recipe "nope" that you can see.' },
    { name: 'a retired recipe', body: { recipeSlug: 'old-steam' }, status: 409, message: 'The recipe "old-steam" is retired; attach the evidence to the recipe that supersedes it.' },
    { name: 'both a recipe and a draft', body: { recipeSlug: 'htst-hot-water', newDraft: { title: 'abc', summary: 'abcdefghijk', loopType: 'flow' } }, status: 400, message: 'Check recipeSlug: Give either recipeSlug (an existing recipe) or newDraft (a new draft recipe), not both.' },
    { name: 'a loop not in the register', body: { recipeSlug: 'htst-hot-water', loopTags: ['FIC-999'] }, status: 400, message: 'The loop FIC-999 is not in the register; add it there first or leave it out.' },
    { name: 'a fit of another test', body: { recipeSlug: 'htst-hot-water', fitId: 999 }, status: 400, message: 'Fit 999 does not belong to step test 1.' },
  ];
  for (const r of refusals) {
    it(`refuses ${r.name} and writes nothing`, async () => {
      const err = await saveEvidence(db.knex, actor, { stepTestId, fitId, tuning, ...r.body }, catalog).catch((e: unknown) => e);
      expect(err).toBeInstanceOf(FieldDataProblem);
      expect((err as FieldDataProblem).status).toBe(r.status);
      expect((err as FieldDataProblem).message).toBe(r.message);
      expect(await db.knex('evidence').count({ n: '*' })).toEqual([{ n: 0 }]);
      expect(await db.knex('model_fits').where({ chosen: true }).count({ n: '*' })).toEqual([{ n: 0 }]);
    });
  }
});
