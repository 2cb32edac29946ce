import type { Knex } from 'knex';
import type { Loop, LoopInput } from '../schemas/loop';

/** Filters of the loop register; every one optional. */
export interface LoopFilter {
  area?: string;
  /** Recipe slug the loops follow. */
  recipe?: string;
  /** Only loops whose tuning was left before this date (YYYY-MM-DD). */
  tunedBefore?: string;
  /** Only loops whose tuning was left on or after this date. */
  tunedSince?: string;
  /** Only loops with no commissioning date. */
  untuned?: boolean;
}

type Row = {
  id: number; tag: string; area: string; description: string; recipe_slug: string | null; tuning: string | null;
  commissioned_by: string | null; commissioned_at: string | null; owner_email: string; created_at: string; updated_at: string;
};

/** Loops matching the filter, by tag. */
export async function listLoops(knex: Knex, f: LoopFilter = {}): Promise<Loop[]> {
  const q = knex<Row>('loops').orderBy('tag');
  if (f.area) q.where('area', f.area);
  if (f.recipe) q.where('recipe_slug', f.recipe);
  if (f.tunedBefore) q.where('commissioned_at', '<', f.tunedBefore);
  if (f.tunedSince) q.where('commissioned_at', '>=', f.tunedSince);
  if (f.untuned) q.whereNull('commissioned_at');
  return withEvidence(knex, await q);
}

/** One loop by tag, or null. */
export async function findLoop(knex: Knex, tag: string): Promise<Loop | null> {
  const row = await knex<Row>('loops').where({ tag }).first();
  return row ? (await withEvidence(knex, [row]))[0] : null;
}

/** Inserts a loop (the tag must be free) and answers it. */
export async function insertLoop(knex: Knex, input: LoopInput, now = new Date()): Promise<Loop> {
  const stamp = now.toISOString();
  await knex('loops').insert({ ...toRow(input), created_at: stamp, updated_at: stamp });
  return (await findLoop(knex, input.tag))!;
}

/** Replaces a loop's fields (its tag may change); answers it, or null when there was none. */
export async function updateLoop(knex: Knex, tag: string, input: LoopInput, now = new Date()): Promise<Loop | null> {
  const n = await knex('loops').where({ tag }).update({ ...toRow(input), updated_at: now.toISOString() });
  return n ? findLoop(knex, input.tag) : null;
}

/** Deletes a loop by tag; true when one was deleted. */
export async function deleteLoop(knex: Knex, tag: string): Promise<boolean> {
  return (await knex('loops').where({ tag }).delete()) > 0;
}

/** Links evidence to loops by tag (unknown tags are the caller's to check). */
export async function linkEvidence(trx: Knex, evidenceId: number, loopIds: number[]): Promise<void> {
  if (loopIds.length) await trx('loop_evidence').insert(loopIds.map((loop_id) => ({ loop_id, evidence_id: evidenceId }))).onConflict().ignore();
}

/** Tags that already exist among the given ones. */
export async function existingTags(knex: Knex, tags: string[]): Promise<Set<string>> {
  if (!tags.length) return new Set();
  const rows = await knex('loops').whereIn('tag', tags).select('tag');
  return new Set(rows.map((r: { tag: string }) => r.tag));
}

function toRow(l: LoopInput) {
  return {
    tag: l.tag, area: l.area, description: l.description, recipe_slug: l.recipeSlug,
    tuning: l.tuning ? JSON.stringify(l.tuning) : null, commissioned_by: l.commissionedBy,
    commissioned_at: l.commissionedAt, owner_email: l.ownerEmail,
  };
}

async function withEvidence(knex: Knex, rows: Row[]): Promise<Loop[]> {
  const links = rows.length
    ? await knex('loop_evidence').whereIn('loop_id', rows.map((r) => r.id)).orderBy('evidence_id').select('loop_id', 'evidence_id')
    : [];
  return rows.map((r) => ({
    id: r.id, tag: r.tag, area: r.area, description: r.description, recipeSlug: r.recipe_slug,
    tuning: r.tuning ? JSON.parse(r.tuning) : null, commissionedBy: r.commissioned_by, commissionedAt: r.commissioned_at,
    ownerEmail: r.owner_email, createdAt: r.created_at, updatedAt: r.updated_at,
    evidenceIds: links.filter((l: { loop_id: number }) => l.loop_id === r.id).map((l: { evidence_id: number }) => l.evidence_id),
  }));
}
