import { insertRecipe, insertRevision, slugTaken } from '../db/authored-recipes';
import { appendAudit } from '../db/audit-log';
import { atLeast, type Actor } from './actor';
import { compileForSave } from './body';
import type { EditorialContext } from './context';
import { forbidden } from './errors';
import type { z } from 'zod';
import type { CreateRecipeSchema } from './fields';
import { reload } from './load';
import { slugFromTitle, uniqueSlug } from './slug';

/** Creates a draft owned by `actor` (author or higher) at revision 1; its slug comes from the title. */
export async function createRecipe(ctx: EditorialContext, actor: Actor, input: z.infer<typeof CreateRecipeSchema>) {
  if (!atLeast(actor, 'author')) throw forbidden('Only authors, curators and admins write recipes.');
  const html = await compileForSave(input.body);
  const { body, message, ...frontmatter } = input;
  const now = ctx.now();
  // The file-recipe lookup reads the database too, so the slug is chosen before the transaction
  // (one connection); a slug taken in between fails the unique index and is chosen again.
  for (let attempt = 0; ; attempt++) {
    const slug = await uniqueSlug(slugFromTitle(input.title), async (s) => (await slugTaken(ctx.knex, s)) || Boolean(await ctx.fileRecipe(s)));
    try {
      await ctx.knex.transaction(async (trx) => {
        const id = await insertRecipe(trx, {
          slug, status: 'draft', owner_id: actor.id, owner_email: actor.email, owner_name: actor.name, current_revision: 1,
          created_at: now, updated_at: now, submitted_at: null, published_at: null, reviewed_at: null, retired_at: null,
          retired_reason: null, superseded_by: null, review_comment: null,
        });
        await insertRevision(trx, {
          recipe_id: id, revision: 1, author_id: actor.id, author_email: actor.email, created_at: now,
          message: message || 'First draft', frontmatter_json: JSON.stringify(frontmatter), body, html,
        });
        await appendAudit(trx, { at: now, actor_id: actor.id, actor_email: actor.email, action: 'create', recipe_slug: slug, from_status: null, to_status: 'draft', revision: 1, comment: null });
      });
      return reload(ctx.knex, slug);
    } catch (err) {
      if (attempt < 3 && /UNIQUE constraint failed: recipes\.slug/.test(String(err))) continue;
      throw err;
    }
  }
}
