/**
 * The recipe catalog of the running server for the field-data services: authored recipes from
 * the editorial tables (seen as the actor may see them), new drafts through the editorial flow.
 */
import type { Knex } from 'knex';
import { findRecipeWithRevision, listRecipesWithRevisions } from '../db/authored-recipes';
import { createRecipe } from '../editorial/create';
import type { EditorialContext } from '../editorial/context';
import { LOOP_TYPES } from '../editorial/fields';
import { canView, frontmatterOf } from '../editorial/view';
import { sendMail } from '../mail/mailer';
import type { Actor } from './actor';
import type { CatalogRecipe, RecipeCatalog } from './recipe-catalog';
import { invalid } from './problem';

export function liveCatalog(knex: Knex, actor: Actor & { id: string }, request: Request): RecipeCatalog {
  const ctx: EditorialContext = {
    knex,
    now: () => new Date().toISOString(),
    fileRecipe: () => null,
    siteUrl: process.env.BETTER_AUTH_URL?.trim() || new URL(request.url).origin,
    async sendMail(messages) {
      for (const m of messages) await sendMail(m);
    },
    onPublishedChange: () => undefined,
  };
  return {
    async find(slug) {
      const row = await findRecipeWithRevision(knex, slug);
      if (!row || !canView(actor, row)) return null;
      const fm = frontmatterOf(row);
      return { slug: row.slug, title: fm.title, loopType: fm.loopType, status: row.status, url: `/recipes/${row.slug}` };
    },
    async published() {
      return (await listRecipesWithRevisions(knex, ['published'])).map((row) => {
        const fm = frontmatterOf(row);
        return { slug: row.slug, title: fm.title, loopType: fm.loopType, model: (fm.model as { type: string } | undefined) ?? null };
      });
    },
    async createDraft(input): Promise<CatalogRecipe | null> {
      const loopType = (LOOP_TYPES as readonly string[]).includes(input.loopType) ? (input.loopType as (typeof LOOP_TYPES)[number]) : null;
      if (!loopType) throw invalid(`newDraft.loopType is one of ${LOOP_TYPES.join(', ')}.`, 'newDraft.loopType');
      const created = await createRecipe(ctx, actor, {
        title: input.title, summary: input.summary, loopType, body: input.body,
        model: input.model as never, controller: input.controller as never, message: 'Started from a step test',
      });
      return { slug: created.slug, title: created.title, loopType: created.loopType, status: created.status, url: created.url };
    },
  };
}

/** Recipes evidence may be attached to: every published one, and drafts the actor may see. */
export async function attachableRecipes(knex: Knex, actor: Actor & { id: string }): Promise<{ slug: string; title: string; loopType: string }[]> {
  const rows = await listRecipesWithRevisions(knex, ['published', 'draft', 'in_review']);
  return rows
    .filter((row) => canView(actor, row))
    .map((row) => {
      const fm = frontmatterOf(row);
      return { slug: row.slug, title: row.status === 'published' ? fm.title : `${fm.title} (${row.status.replace('_', ' ')})`, loopType: fm.loopType };
    })
    .sort((a, b) => a.title.localeCompare(b.title));
}
