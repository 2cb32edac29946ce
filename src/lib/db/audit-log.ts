import type { Knex } from 'knex';

export interface AuditEntry {
  id: number;
  at: string;
  actor_id: string;
  actor_email: string;
  action: string;
  recipe_slug: string | null;
  from_status: string | null;
  to_status: string | null;
  revision: number | null;
  comment: string | null;
}

export async function appendAudit(knex: Knex, entry: Omit<AuditEntry, 'id'>): Promise<void> {
  await knex('audit_log').insert(entry);
}

/** Newest first; `before` pages back by id. */
export function listAudit(knex: Knex, options: { limit?: number; before?: number | null; slug?: string | null } = {}): Promise<AuditEntry[]> {
  const q = knex<AuditEntry>('audit_log').orderBy('id', 'desc').limit(Math.min(options.limit ?? 100, 500));
  if (options.before) q.where('id', '<', options.before);
  if (options.slug) q.where({ recipe_slug: options.slug });
  return q;
}
