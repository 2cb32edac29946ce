import type { APIRoute } from 'astro';
import { asRole, database } from '../../../../lib/fielddata/http';
import { exportLoops } from '../../../../lib/fielddata/service/loops';

export const prerender = false;

/** GET /api/v1/loops/export.csv (reader+, same filters as the list) → the register as CSV. */
export const GET: APIRoute = (context) =>
  asRole(context, 'reader', async () => {
    const csv = await exportLoops(database(), Object.fromEntries(context.url.searchParams));
    const day = new Date().toISOString().slice(0, 10);
    return new Response(csv, {
      headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="loop-register-${day}.csv"`, 'Cache-Control': 'no-store' },
    });
  });
