import type { APIRoute } from 'astro';
import { bundledMigrations, db } from '../../lib/db';
import { checkDatabase } from '../../lib/db/health';
import { APP_VERSION } from '../../lib/version';

/** Liveness and readiness: 200 when the database answers and no migration is pending, else 503. */
export const GET: APIRoute = async () => {
  let database;
  try {
    database = await checkDatabase(db(), bundledMigrations);
  } catch (err) {
    database = { reachable: false, migrationsCurrent: false, pendingMigrations: [], error: String(err) };
  }
  const ok = database.reachable && database.migrationsCurrent;
  return Response.json(
    { status: ok ? 'ok' : 'unavailable', version: APP_VERSION, database },
    { status: ok ? 200 : 503, headers: { 'Cache-Control': 'no-store' } },
  );
};
