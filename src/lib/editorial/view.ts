import type { AuthoredRecipeRow, AuthoredRecipeWithRevision } from '../db/authored-recipes';
import type { RatingSummary } from '../db/recipe-ratings';
import { atLeast, type Actor } from './actor';
import type { AuthoredFields } from './fields';

/** Drafts and recipes in review are seen by their owner and by curators and admins only. */
export function canView(actor: Actor | null, row: Pick<AuthoredRecipeRow, 'status' | 'owner_id'>): boolean {
  if (!actor) return false;
  if (row.status === 'published' || row.status === 'retired') return true;
  return row.owner_id === actor.id || atLeast(actor, 'curator');
}

/** The stored frontmatter of a revision (written by this module's callers from validated input). */
export function frontmatterOf(row: AuthoredRecipeWithRevision): Omit<AuthoredFields, 'body'> {
  return JSON.parse(row.revision.frontmatter_json);
}

/** An authored recipe as the API answers it (the contract's fields, plus a few more). */
export function toApiRecipe(row: AuthoredRecipeWithRevision, rating: RatingSummary) {
  const fm = frontmatterOf(row);
  const retired = row.status === 'retired';
  return {
    slug: row.slug,
    title: fm.title,
    summary: fm.summary,
    loopType: fm.loopType,
    status: row.status,
    revision: row.current_revision,
    body: row.revision.body,
    model: fm.model ?? null,
    controller: fm.controller ?? null,
    claims: fm.claims ?? [],
    sensor: fm.sensor ?? null,
    tuningRule: fm.tuningRule ?? null,
    modelSource: fm.modelSource ?? null,
    area: fm.area ?? null,
    loopTags: fm.loopTags ?? [],
    units: fm.units ?? null,
    tags: fm.tags ?? [],
    cautions: fm.cautions ?? [],
    ownerEmail: row.owner_email,
    ownerName: row.owner_name,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    reviewedAt: row.reviewed_at,
    rating,
    source: 'authored' as const,
    url: `/recipes/${row.slug}`,
    retiredReason: retired ? row.retired_reason : null,
    supersededBy: retired ? row.superseded_by : null,
    reviewComment: row.review_comment,
    revisionMessage: row.revision.message,
    revisionAuthorEmail: row.revision.author_email,
    /** The compiled, sanitized body with calculator placeholders. */
    html: row.revision.html,
  };
}

export type ApiAuthoredRecipe = ReturnType<typeof toApiRecipe>;
