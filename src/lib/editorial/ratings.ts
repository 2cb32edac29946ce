import type { z } from 'zod';
import { findRating, listFieldNotes, ratingSummary, upsertRating } from '../db/recipe-ratings';
import { watcherEmails } from '../db/recipe-watchers';
import type { Actor } from './actor';
import { afterCommit, type EditorialContext } from './context';
import type { RatingSchema } from './fields';
import { recipeLink } from './load';
import { mails } from './notify';
import { findTarget } from './target';

/**
 * Records `actor`'s rating of a recipe (one per person: a second call replaces the first) and
 * answers the recipe's new rating. A new or changed field note is mailed to the watchers.
 */
export async function rateRecipe(ctx: EditorialContext, actor: Actor, slug: string, input: z.infer<typeof RatingSchema>) {
  const target = await findTarget(ctx, actor, slug);
  const note = input.note ? input.note : null;
  const previous = await findRating(ctx.knex, slug, actor.id);
  await ctx.knex.transaction((trx) =>
    upsertRating(trx, { recipe_slug: slug, user_id: actor.id, user_email: actor.email, user_name: actor.name, stars: input.stars, note, updated_at: ctx.now(), now: ctx.now() }),
  );
  const rating = await ratingSummary(ctx.knex, slug);
  if (note && note !== previous?.note) {
    const to = await watcherEmails(ctx.knex, slug, actor.id);
    await afterCommit(ctx, to.map((e) => mails.watchedFieldNote(e, target.title, actor.name, input.stars, note, recipeLink(ctx, slug))), null);
  }
  return { slug, rating, mine: { stars: input.stars, note } };
}

/** The field notes of a recipe, newest first, with who wrote them and their stars. */
export async function fieldNotes(ctx: EditorialContext, actor: Actor, slug: string) {
  await findTarget(ctx, actor, slug);
  const rows = await listFieldNotes(ctx.knex, slug);
  const mine = await findRating(ctx.knex, slug, actor.id);
  return {
    slug,
    rating: await ratingSummary(ctx.knex, slug),
    mine: mine ? { stars: mine.stars, note: mine.note } : null,
    notes: rows.map((r) => ({ name: r.user_name, email: r.user_email, stars: r.stars, note: r.note, updatedAt: r.updated_at })),
  };
}
