import { diffLines } from 'diff';
import { findRevision, listRevisions } from '../db/authored-recipes';
import type { Actor } from './actor';
import type { EditorialContext } from './context';
import { EditorialError } from './errors';
import { loadForWrite } from './load';

/** Every revision of an authored recipe (who, when, message), oldest first. */
export async function revisionHistory(ctx: EditorialContext, actor: Actor, slug: string) {
  const row = await loadForWrite(ctx, actor, slug);
  const rows = await listRevisions(ctx.knex, row.id);
  return {
    slug,
    current: row.current_revision,
    revisions: rows.map((r) => ({ revision: r.revision, authorEmail: r.author_email, createdAt: r.created_at, message: r.message })),
  };
}

/** The text a revision is compared by: its fields as sorted JSON lines, then the body. */
function comparable(frontmatterJson: string, body: string): string {
  const fm = JSON.parse(frontmatterJson) as Record<string, unknown>;
  const fields = Object.keys(fm).sort().map((k) => `${k}: ${JSON.stringify(fm[k])}`).join('\n');
  return `${fields}\n---\n${body.endsWith('\n') ? body : `${body}\n`}`;
}

/** A line diff between two revisions: runs of added, removed and unchanged lines. */
export async function revisionDiff(ctx: EditorialContext, actor: Actor, slug: string, from: number, to: number) {
  const row = await loadForWrite(ctx, actor, slug);
  const [a, b] = await Promise.all([findRevision(ctx.knex, row.id, from), findRevision(ctx.knex, row.id, to)]);
  if (!a || !b) {
    throw new EditorialError(400, 'invalid_request', `"${slug}" has revisions 1 to ${row.current_revision}; choose two of those.`, a ? 'to' : 'from');
  }
  const parts = diffLines(comparable(a.frontmatter_json, a.body), comparable(b.frontmatter_json, b.body));
  const runs = parts.map((p) => ({
    op: p.added ? ('added' as const) : p.removed ? ('removed' as const) : ('same' as const),
    lines: p.value.replace(/\n$/, '').split('\n'),
  }));
  const count = (op: string) => runs.filter((r) => r.op === op).reduce((n, r) => n + r.lines.length, 0);
  return { slug, from, to, added: count('added'), removed: count('removed'), runs };
}
