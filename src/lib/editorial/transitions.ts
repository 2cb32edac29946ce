import { findRecipeRow, updateRecipeRow, type AuthoredRecipeRow } from '../db/authored-recipes';
import { appendAudit } from '../db/audit-log';
import { curatorEmails } from '../db/curators';
import { watcherEmails } from '../db/recipe-watchers';
import { atLeast, type Actor } from './actor';
import { afterCommit, type EditorialContext, type OutgoingMail } from './context';
import { EditorialError, forbidden } from './errors';
import { loadForWrite, recipeLink, reload } from './load';
import { mails } from './notify';
import { reviewReadiness } from './readiness';
import { TRANSITIONS, type Transition } from './status';
import { frontmatterOf } from './view';
import { loopOwnerNotices } from '../fielddata/service/retire';

/** What a transition carries: a curator's comment (return) or a reason and successor (retire). */
export interface TransitionInput {
  comment?: string;
  reason?: string;
  supersededBy?: string;
}

const ROLE_WORDS = { author: 'authors', curator: 'curators', reader: 'readers', admin: 'admins' } as const;

/**
 * Moves a recipe along the state machine (status.ts). Refusals: 403 for a role or person who
 * may not act, 409 invalid_transition from the wrong status, 409 read_only for file recipes.
 * The change, its audit entry and the recipe's review fields are written in one transaction;
 * mail and the search index follow the commit.
 */
export async function transitionRecipe(ctx: EditorialContext, actor: Actor, slug: string, kind: Transition, input: TransitionInput = {}) {
  const rule = TRANSITIONS[kind];
  if (!atLeast(actor, rule.minRole)) throw forbidden(`Only ${ROLE_WORDS[rule.minRole]} and above can do that.`);
  const row = await loadForWrite(ctx, actor, slug);
  if (rule.ownerOnly && row.owner_id !== actor.id) throw forbidden(`Only its owner (${row.owner_email}) submits "${slug}" for review.`);
  if (row.status !== rule.from) {
    throw new EditorialError(409, 'invalid_transition', `"${slug}" is ${row.status.replace('_', ' ')}; only a recipe that is ${rule.from.replace('_', ' ')} can be ${rule.verb}.`);
  }
  if (kind === 'retire' && input.supersededBy) await checkSuccessor(ctx, slug, input.supersededBy);
  if (kind === 'submit') {
    const missing = reviewReadiness(row);
    if (missing) throw missing;
  }

  const now = ctx.now();
  const changes: Partial<AuthoredRecipeRow> = { status: rule.to, updated_at: now };
  if (kind === 'submit') Object.assign(changes, { submitted_at: now, review_comment: null });
  if (kind === 'publish') Object.assign(changes, { published_at: now, reviewed_at: now, review_comment: null });
  if (kind === 'return') changes.review_comment = input.comment ?? null;
  if (kind === 'retire') Object.assign(changes, { retired_at: now, retired_reason: input.reason ?? null, superseded_by: input.supersededBy ?? null });
  await ctx.knex.transaction(async (trx) => {
    // Re-read inside the transaction: two curators acting at once must not both succeed.
    const fresh = await findRecipeRow(trx, slug);
    if (!fresh || fresh.status !== rule.from) throw new EditorialError(409, 'invalid_transition', `"${slug}" changed status meanwhile; reload it.`);
    await updateRecipeRow(trx, row.id, changes);
    await appendAudit(trx, {
      at: now, actor_id: actor.id, actor_email: actor.email, action: kind, recipe_slug: slug, from_status: rule.from, to_status: rule.to,
      revision: row.current_revision, comment: input.comment ?? input.reason ?? null,
    });
  });
  const title = frontmatterOf(row).title;
  const link = recipeLink(ctx, slug);
  const out: OutgoingMail[] = [];
  const owner = row.owner_id === actor.id ? [] : [row.owner_email];
  if (kind === 'submit') for (const to of await curatorEmails(ctx.knex)) if (to !== actor.email) out.push(mails.submitted(to, title, actor.name, link));
  if (kind === 'publish') {
    for (const to of owner) out.push(mails.published(to, title, actor.name, link));
    for (const to of await watcherEmails(ctx.knex, slug, actor.id)) if (!owner.includes(to)) out.push(mails.watchedRevision(to, title, row.current_revision, link));
  }
  if (kind === 'return') for (const to of owner) out.push(mails.returned(to, title, actor.name, input.comment ?? '', link));
  if (kind === 'retire') {
    const successor = input.supersededBy ? recipeLink(ctx, input.supersededBy) : null;
    for (const to of owner) out.push(mails.retiredOwner(to, title, input.reason ?? '', successor, link));
    for (const to of await watcherEmails(ctx.knex, slug, actor.id)) if (!owner.includes(to)) out.push(mails.watchedRetired(to, title, input.reason ?? '', successor, link));
    out.push(...(await loopOwnerNotices(ctx.knex, { slug, title, reason: input.reason ?? '', supersededBy: input.supersededBy ?? null, retiredBy: actor.name, siteUrl: ctx.siteUrl })));
  }
  await afterCommit(ctx, out, kind === 'publish' || kind === 'retire' ? slug : null);
  return reload(ctx.knex, slug);
}

async function checkSuccessor(ctx: EditorialContext, slug: string, successor: string): Promise<void> {
  if (successor === slug) throw new EditorialError(400, 'invalid_request', 'A recipe cannot supersede itself; name the recipe that replaces it.', 'supersededBy');
  const authored = await findRecipeRow(ctx.knex, successor);
  const file = authored ? null : await ctx.fileRecipe(successor);
  const status = authored?.status ?? file?.status;
  if (status !== 'published') {
    throw new EditorialError(400, 'invalid_request', status
      ? `The successor "${successor}" is ${status.replace('_', ' ')}; name a published recipe.`
      : `There is no recipe "${successor}"; give the slug of the published recipe that replaces this one.`, 'supersededBy');
  }
}
