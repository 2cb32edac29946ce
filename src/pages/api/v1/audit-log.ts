import type { APIRoute } from 'astro';
import { listAudit } from '../../../lib/db/audit-log';
import { db } from '../../../lib/db';
import { atLeast } from '../../../lib/editorial/actor';
import { forbidden } from '../../../lib/editorial/errors';
import { editorialRoute, json } from '../../../lib/editorial/http';

/** GET /api/v1/audit-log?before=&slug= (admin): every editorial state change, newest first, 100 a page. */
export const GET: APIRoute = ({ locals, url }) =>
  editorialRoute(locals, async (actor) => {
    if (!atLeast(actor, 'admin')) throw forbidden('The audit log is for admins.');
    const before = Number(url.searchParams.get('before')) || null;
    const rows = await listAudit(db(), { before, slug: url.searchParams.get('slug') });
    return json({
      entries: rows.map((r) => ({ id: r.id, at: r.at, actorEmail: r.actor_email, action: r.action, recipe: r.recipe_slug, from: r.from_status, to: r.to_status, revision: r.revision, comment: r.comment })),
      next: rows.length === 100 ? rows[rows.length - 1].id : null,
    });
  });
