import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { insertRecipe, insertRevision } from '../../../../src/lib/db/authored-recipes';
import { transitionRecipe } from '../../../../src/lib/editorial/transitions';
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
    // A published authored recipe written straight to its tables: the body compiler is not under test here.
    slug = 'htst-hot-water-temperature-pi';
    const now = '2026-11-02T08:00:00.000Z';
    const id = await insertRecipe(t.knex, {
      slug, status: 'published', owner_id: PEOPLE.author.id, owner_email: PEOPLE.author.email, owner_name: PEOPLE.author.name, current_revision: 1,
      created_at: now, updated_at: now, submitted_at: now, published_at: now, reviewed_at: now, retired_at: null, retired_reason: null, superseded_by: null, review_comment: null,
    });
    const { body, ...frontmatter } = DRAFT;
    await insertRevision(t.knex, { recipe_id: id, revision: 1, author_id: PEOPLE.author.id, author_email: PEOPLE.author.email, created_at: now, message: 'First draft', frontmatter_json: JSON.stringify(frontmatter), body, html: '<p>On TIC-210.</p>' });
    const loop = { area: 'htst', description: 'Hot-water set', recipeSlug: slug, tuning: null, commissionedBy: null, commissionedAt: null };
    await insertLoop(t.knex, { ...loop, tag: 'TIC-210', ownerEmail: 'wren.adeyemi@brindlewood.example' });
    await insertLoop(t.knex, { ...loop, tag: 'TIC-211', ownerEmail: 'wren.adeyemi@brindlewood.example' });
    await insertLoop(t.knex, { ...loop, tag: 'TIC-212', ownerEmail: 'luca.brandt@brindlewood.example' });
    await insertLoop(t.knex, { ...loop, tag: 'FIC-101', recipeSlug: null, ownerEmail: 'nobody@brindlewood.example' });
    t.mail.length = 0;
  });
  afterEach(() => t.cleanup());

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
