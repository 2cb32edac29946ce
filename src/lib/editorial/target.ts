import { findRecipeWithRevision } from '../db/authored-recipes';
import type { Actor } from './actor';
import type { EditorialContext } from './context';
import { notFound } from './errors';
import { canView, frontmatterOf } from './view';

/** Any recipe a person may rate or watch: a file recipe, or an authored one they can see. */
export interface RecipeTarget {
  slug: string;
  title: string;
  source: 'file' | 'authored';
  status: string;
}

export async function findTarget(ctx: EditorialContext, actor: Actor, slug: string): Promise<RecipeTarget> {
  const row = await findRecipeWithRevision(ctx.knex, slug);
  if (row) {
    if (!canView(actor, row)) throw notFound(slug);
    return { slug, title: frontmatterOf(row).title, source: 'authored', status: row.status };
  }
  const file = await ctx.fileRecipe(slug);
  if (!file) throw notFound(slug);
  return { slug, title: file.title, source: 'file', status: file.status };
}
