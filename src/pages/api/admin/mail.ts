import type { APIRoute } from 'astro';
import { db } from '../../../lib/db';
import { requireRole } from '../../../lib/auth/guard';
import { listCaptured } from '../../../lib/mail/captured';

export const prerender = false;

/** GET /api/admin/mail (admin) → `{ messages }`, newest first: what the demo mail server caught. */
export const GET: APIRoute = async (context) => {
  const { response } = requireRole(context, 'admin');
  if (response) return response;
  return Response.json({ messages: await listCaptured(db()) }, { headers: { 'Cache-Control': 'no-store' } });
};
