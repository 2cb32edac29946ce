import type { APIRoute } from 'astro';
import { db } from '../../../lib/db';
import { requireRole } from '../../../lib/auth/guard';
import { listPeople } from '../../../lib/auth/people';

export const prerender = false;

/** GET /api/admin/people (admin) → `{ people: Person[] }`. */
export const GET: APIRoute = async (context) => {
  const { response } = requireRole(context, 'admin');
  if (response) return response;
  return Response.json({ people: await listPeople(db()) }, { headers: { 'Cache-Control': 'no-store' } });
};
