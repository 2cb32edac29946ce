import { findRecipeWithRevision, type AuthoredRecipeWithRevision } from '../db/authored-recipes';
import { ratingSummary } from '../db/recipe-ratings';
import type { Actor } from './actor';
import type { EditorialContext } from './context';
import { notFound, readOnly } from './errors';
import { canView, toApiRecipe } from './view';
import type { Knex } from 'knex';

/** The authored recipe `slug` as `actor` may see it; 409 read_only for a file recipe, else 404. */
export async function loadForWrite(ctx: EditorialContext, actor: Actor, slug: string, knex: Knex = ctx.knex): Promise<AuthoredRecipeWithRevision> {
  const row = await findRecipeWithRevision(knex, slug);
  if (!row) {
    if (await ctx.fileRecipe(slug)) throw readOnly(slug);
    throw notFound(slug);
  }
  if (!canView(actor, row)) throw notFound(slug);
  return row;
}

/** The recipe in the API's shape, with its rating. */
export async function apiRecipe(knex: Knex, row: AuthoredRecipeWithRevision) {
  return toApiRecipe(row, await ratingSummary(knex, row.slug));
}

/** Reloads `slug` after a change and answers it in the API's shape. */
export async function reload(knex: Knex, slug: string) {
  const row = await findRecipeWithRevision(knex, slug);
  if (!row) throw notFound(slug);
  return apiRecipe(knex, row);
}

/** The full link of a recipe's page, for e-mails. */
export function recipeLink(ctx: EditorialContext, slug: string): string {
  return `${ctx.siteUrl.replace(/\/$/, '')}/recipes/${slug}`;
}
