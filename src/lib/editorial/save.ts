import type { z } from 'zod';
import { advanceRevision, insertRevision } from '../db/authored-recipes';
import { appendAudit } from '../db/audit-log';
import { watcherEmails } from '../db/recipe-watchers';
import { atLeast, type Actor } from './actor';
import { compileForSave } from './body';
import { afterCommit, type EditorialContext } from './context';
import { EditorialError, forbidden } from './errors';
import type { UpdateRecipeSchema } from './fields';
import { loadForWrite, recipeLink, reload } from './load';
import { mails } from './notify';
import { editableBy, type RecipeStatus } from './status';
import { frontmatterOf } from './view';

/**
 * Saves a change as a new revision. `baseRevision` must be the current revision (optimistic
 * locking, re-checked inside the transaction): otherwise 409 conflict with the current recipe,
 * and nothing is written. A curator's change to a published recipe is published at once.
 */
export async function saveRecipe(ctx: EditorialContext, actor: Actor, slug: string, input: z.infer<typeof UpdateRecipeSchema>) {
  if (!atLeast(actor, 'author')) throw forbidden('Readers cannot change recipes; ask an author.');
  const row = await loadForWrite(ctx, actor, slug);
  const isOwner = row.owner_id === actor.id;
  const isCurator = atLeast(actor, 'curator');
  if (!isOwner && !isCurator) throw forbidden(`Only its owner (${row.owner_email}) or a curator can change "${slug}".`);
  if (!editableBy(row.status as RecipeStatus, isOwner, isCurator)) {
    throw new EditorialError(409, 'invalid_transition', row.status === 'retired'
      ? `"${slug}" is retired and cannot change; write a new recipe instead.`
      : `"${slug}" is published: a curator changes it, or ask one to retire it and write a successor.`);
  }
  const conflict = async () =>
    new EditorialError(409, 'conflict', `Someone saved revision ${(await reload(ctx.knex, slug)).revision} while you edited revision ${input.baseRevision}; compare both versions and save again on top of the current one.`, 'baseRevision', { current: await reload(ctx.knex, slug) });
  if (input.baseRevision !== row.current_revision) throw await conflict();

  const { baseRevision, message, body: newBody, ...changes } = input;
  const body = newBody ?? row.revision.body;
  const html = newBody === undefined ? row.revision.html : await compileForSave(newBody);
  // A null change removes the field, so the stored frontmatter never holds null.
  const frontmatter = Object.fromEntries(Object.entries({ ...frontmatterOf(row), ...changes }).filter(([, v]) => v !== null));
  const now = ctx.now();
  const next = baseRevision + 1;
  const saved = await ctx.knex.transaction(async (trx) => {
    if (!(await advanceRevision(trx, row.id, baseRevision, { current_revision: next, updated_at: now }))) return false;
    await insertRevision(trx, {
      recipe_id: row.id, revision: next, author_id: actor.id, author_email: actor.email, created_at: now,
      message: message || `Revision ${next}`, frontmatter_json: JSON.stringify(frontmatter), body, html,
    });
    await appendAudit(trx, { at: now, actor_id: actor.id, actor_email: actor.email, action: 'save', recipe_slug: slug, from_status: row.status, to_status: row.status, revision: next, comment: message ?? null });
    return true;
  });
  if (!saved) throw await conflict();
  const recipe = await reload(ctx.knex, slug);
  if (row.status === 'published') {
    const to = await watcherEmails(ctx.knex, slug, actor.id);
    await afterCommit(ctx, to.map((e) => mails.watchedRevision(e, recipe.title, next, recipeLink(ctx, slug))), slug);
  }
  return recipe;
}

