import type { APIRoute } from 'astro';
import { db } from '../../../../lib/db';
import { getAuth } from '../../../../lib/auth/auth';
import { changePerson } from '../../../../lib/auth/admin-actions';
import { requireRole } from '../../../../lib/auth/guard';
import { jsonError, readBody } from '../../../../lib/auth/http';
import { personChangeSchema } from '../../../../lib/auth/people';

export const prerender = false;

/** PATCH /api/admin/people/{id} (admin) with `{ role?, active? }` → `{ person }`. */
export const PATCH: APIRoute = async (context) => {
  const { user, response } = requireRole(context, 'admin');
  if (response) return response;
  const body = await readBody(context.request, personChangeSchema);
  if (body.response) return body.response;
  const result = await changePerson(getAuth(), db(), context.params.id ?? '', body.data, user);
  if (result.error) return jsonError(result.error.status, result.error.code, result.error.message, result.error.field);
  return Response.json({ person: result.person });
};
