/**
 * The recipe catalog of the running server for the field-data services: the recipe library
 * (file recipes) and authored recipes from the editorial tables, each seen as the actor may see
 * it; new drafts go through the editorial flow. Server side only (the library reads the
 * content collection).
 */
import type { Knex } from 'knex';
import { findRecipeWithRevision, listRecipesWithRevisions } from '../db/authored-recipes';
import { createRecipe } from '../editorial/create';
import type { EditorialContext } from '../editorial/context';
import { LOOP_TYPES } from '../editorial/fields';
import { canView, frontmatterOf } from '../editorial/view';
import { sendMail } from '../mail/mailer';
import { canSee } from '../recipes/access';
import { allRecipes, findRecipe } from '../recipes/library';
import type { RecipeRecord } from '../recipes/record';
import type { Actor } from './actor';
import type { CatalogRecipe, RecipeCatalog } from './recipe-catalog';
import { invalid } from './problem';

export function liveCatalog(knex: Knex, actor: Actor & { id: string }, request: Request): RecipeCatalog {
  const ctx: EditorialContext = {
    knex,
    now: () => new Date().toISOString(),
    async fileRecipe(slug) {
      const record = await findRecipe(slug);
      return record && record.source === 'file' ? { title: record.data.title, status: record.data.status } : null;
    },
    siteUrl: process.env.BETTER_AUTH_URL?.trim() || new URL(request.url).origin,
    async sendMail(messages) {
      for (const m of messages) await sendMail(m);
    },
    onPublishedChange: () => undefined,
  };
  return {
    async find(slug) {
      const file = await findRecipe(slug);
      if (file) return canSee(actor, file) ? fromRecord(file) : null;
      const row = await findRecipeWithRevision(knex, slug);
      if (!row || !canView(actor, row)) return null;
      const fm = frontmatterOf(row);
      return { slug: row.slug, title: fm.title, loopType: fm.loopType, status: row.status, url: `/recipes/${row.slug}` };
    },
    async published() {
      const files = (await allRecipes()).filter((r) => r.data.status === 'published');
      const authored = (await listRecipesWithRevisions(knex, ['published'])).map((row) => {
        const fm = frontmatterOf(row);
        return { slug: row.slug, title: fm.title, loopType: fm.loopType, model: (fm.model as { type: string } | undefined) ?? null };
      });
      const seen = new Set(files.map((r) => r.slug));
      return [...files.map((r) => ({ slug: r.slug, title: r.data.title, loopType: r.data.loopType, model: r.data.model as { type: string } })), ...authored.filter((a) => !seen.has(a.slug))];
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
  const label = (title: string, status: string) => (status === 'published' ? title : `${title} (${status.replace('_', ' ')})`);
  const files = (await allRecipes()).filter((r) => r.data.status !== 'retired' && canSee(actor, r));
  const seen = new Set(files.map((r) => r.slug));
  const rows = await listRecipesWithRevisions(knex, ['published', 'draft', 'in_review']);
  const authored = rows
    .filter((row) => canView(actor, row) && !seen.has(row.slug))
    .map((row) => {
      const fm = frontmatterOf(row);
      return { slug: row.slug, title: label(fm.title, row.status), loopType: fm.loopType };
    });
  return [...files.map((r) => ({ slug: r.slug, title: label(r.data.title, r.data.status), loopType: r.data.loopType })), ...authored].sort((a, b) => a.title.localeCompare(b.title));
}

function fromRecord(r: RecipeRecord): CatalogRecipe {
  return { slug: r.slug, title: r.data.title, loopType: r.data.loopType, status: r.data.status, url: `/recipes/${r.slug}` };
}
