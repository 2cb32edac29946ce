import { listRecipesWithRevisions } from '../db/authored-recipes';
import { allRatingSummaries } from '../db/recipe-ratings';
import { atLeast, type Actor } from './actor';
import type { EditorialContext } from './context';
import { forbidden } from './errors';
import { frontmatterOf } from './view';

/** When a published recipe counts as stale: not reviewed for `staleDays`, or rated below `lowRating` by at least `minRatings` people. */
export interface StaleRule {
  staleDays: number;
  lowRating: number;
  minRatings: number;
}

/** LOOPWRIGHT_STALE_DAYS (default 365); a rating average below 3 from 2 or more people. */
export function staleRule(env: NodeJS.ProcessEnv = process.env): StaleRule {
  const days = Number(env.LOOPWRIGHT_STALE_DAYS);
  return { staleDays: Number.isFinite(days) && days > 0 ? days : 365, lowRating: 3, minRatings: 2 };
}

/** Something a file recipe tells the queue: its slug, title and last review date (YYYY-MM-DD). */
export interface FileRecipeReview {
  slug: string;
  title: string;
  reviewed: string;
  status: string;
}

/**
 * The curator's queue: recipes waiting for review (oldest submission first), and published
 * recipes — authored or file — that are stale, with why.
 */
export async function reviewQueue(ctx: EditorialContext, actor: Actor, fileRecipes: FileRecipeReview[] = [], rule = staleRule()) {
  if (!atLeast(actor, 'curator')) throw forbidden('The review queue is for curators and admins.');
  const rows = await listRecipesWithRevisions(ctx.knex, ['in_review', 'published']);
  const ratings = await allRatingSummaries(ctx.knex);
  const cutoff = new Date(Date.parse(ctx.now()) - rule.staleDays * 86_400_000).toISOString();
  const waiting = rows
    .filter((r) => r.status === 'in_review')
    .sort((a, b) => (a.submitted_at ?? '').localeCompare(b.submitted_at ?? ''))
    .map((r) => ({ slug: r.slug, title: frontmatterOf(r).title, ownerEmail: r.owner_email, submittedAt: r.submitted_at, revision: r.current_revision, url: `/recipes/${r.slug}` }));
  const candidates = [
    ...rows.filter((r) => r.status === 'published').map((r) => ({ slug: r.slug, title: frontmatterOf(r).title, reviewedAt: r.reviewed_at, source: 'authored' as const })),
    ...fileRecipes.filter((f) => f.status === 'published').map((f) => ({ slug: f.slug, title: f.title, reviewedAt: `${f.reviewed}T00:00:00.000Z`, source: 'file' as const })),
  ];
  const stale = candidates.flatMap((c) => {
    const rating = ratings.get(c.slug) ?? { average: null, count: 0 };
    const reasons: string[] = [];
    if (!c.reviewedAt || c.reviewedAt < cutoff) reasons.push(`not reviewed for over ${rule.staleDays} days`);
    if (rating.average !== null && rating.count >= rule.minRatings && rating.average < rule.lowRating) reasons.push(`rated ${rating.average} by ${rating.count} people`);
    return reasons.length ? [{ ...c, rating, reasons, url: `/recipes/${c.slug}` }] : [];
  });
  return { waiting, stale, staleDays: rule.staleDays };
}
