import type { APIRoute } from 'astro';
import { db } from '../../../lib/db';
import { getAuth } from '../../../lib/auth/auth';
import { invitePerson } from '../../../lib/auth/admin-actions';
import { requireRole } from '../../../lib/auth/guard';
import { jsonError, readBody } from '../../../lib/auth/http';
import { invitationRequestSchema } from '../../../lib/auth/invitations';

export const prerender = false;

/** POST /api/admin/invitations (admin) with `{ email, name, role }` → 201 `{ person }`; the link goes out by e-mail. */
export const POST: APIRoute = async (context) => {
  const { user, response } = requireRole(context, 'admin');
  if (response) return response;
  const body = await readBody(context.request, invitationRequestSchema);
  if (body.response) return body.response;
  const result = await invitePerson(getAuth(), db(), body.data, user);
  if (result.error) return jsonError(result.error.status, result.error.code, result.error.message, result.error.field);
  return Response.json({ person: result.person }, { status: 201 });
};
