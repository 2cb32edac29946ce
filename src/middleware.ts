import { defineMiddleware } from 'astro:middleware';
import { ensureMigrated } from './lib/db';

/**
 * Runs pending migrations before the first request is served (the standalone server loads
 * middleware lazily, so "at start" means at the first request). A database that cannot be
 * opened is reported by /api/health as 503 rather than crashing the server.
 */
export const onRequest = defineMiddleware(async (_context, next) => {
  try {
    await ensureMigrated();
  } catch (err) {
    console.error('Database not ready:', err instanceof Error ? err.message : err);
  }
  return next();
});
