import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createRecipe } from '../../../../src/lib/editorial/create';
import { transitionRecipe } from '../../../../src/lib/editorial/transitions';
import { stopCompileWorker } from '../../../../src/lib/recipes/authored-mdx/compile-isolated';
import { insertLoop } from '../../../../src/lib/db/loops';
import { seed as seedAreas } from '../../../../src/lib/db/seeds/01-plant-areas';
import { loopsFollowing } from '../../../../src/lib/fielddata/service/recipe-field-data';
import { DRAFT, PEOPLE, testContext } from '../../editorial/context';

type T = Awaited<ReturnType<typeof testContext>>;

describe('retiring a recipe that loops follow', () => {
  let t: T;
  let slug: string;
  beforeEach(async () => {
    t = await testContext();
    await seedAreas(t.knex);
    slug = (await createRecipe(t.ctx, PEOPLE.author, DRAFT)).slug;
    await transitionRecipe(t.ctx, PEOPLE.author, slug, 'submit');
    await transitionRecipe(t.ctx, PEOPLE.curator, slug, 'publish');
    const loop = { area: 'htst', description: 'Hot-water set', recipeSlug: slug, tuning: null, commissionedBy: null, commissionedAt: null };
    await insertLoop(t.knex, { ...loop, tag: 'TIC-210', ownerEmail: 'wren.adeyemi@brindlewood.example' });
    await insertLoop(t.knex, { ...loop, tag: 'TIC-211', ownerEmail: 'wren.adeyemi@brindlewood.example' });
    await insertLoop(t.knex, { ...loop, tag: 'TIC-212', ownerEmail: 'luca.brandt@brindlewood.example' });
    await insertLoop(t.knex, { ...loop, tag: 'FIC-101', recipeSlug: null, ownerEmail: 'nobody@brindlewood.example' });
    t.mail.length = 0;
  });
  afterEach(() => t.cleanup());
  afterAll(() => stopCompileWorker());

  it('lists the loops that still follow it', async () => {
    expect((await loopsFollowing(t.knex, slug)).map((l) => l.tag)).toEqual(['TIC-210', 'TIC-211', 'TIC-212']);
  });

  it('mails each loop owner once, naming their loops and the replacement', async () => {
    await transitionRecipe(t.ctx, PEOPLE.curator, slug, 'retire', { reason: 'The steam valve was replaced', supersededBy: 'raw-milk-transfer-flow' });
    const loopMail = t.mail.filter((m) => m.subject.startsWith('Recipe retired:'));
    expect(loopMail.map((m) => [m.to, m.subject])).toEqual([
      ['wren.adeyemi@brindlewood.example', `Recipe retired: ${DRAFT.title} (2 of your loops)`],
      ['luca.brandt@brindlewood.example', `Recipe retired: ${DRAFT.title} (TIC-212)`],
    ]);
    expect(loopMail[0].text).toContain('  TIC-210 (htst) – Hot-water set\n  TIC-211 (htst) – Hot-water set');
    expect(loopMail[0].text).toContain('The steam valve was replaced');
    expect(loopMail[0].text).toContain('http://loopwright.test/recipes/raw-milk-transfer-flow');
  });
});
