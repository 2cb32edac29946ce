import { defineMiddleware } from 'astro:middleware';
import { ensureMigrated } from './lib/db';
import { unauthenticated } from './lib/auth/http';
import { productionBlockers } from './lib/auth/production-gate';
import { isPublicPath, isSessionFree, isStaticAsset } from './lib/auth/public-paths';
import { sessionFromHeaders } from './lib/auth/session';

/**
 * Per request: migrations before the first request is served (the standalone server loads
 * middleware lazily, so "at start" means at the first request; a database that cannot be
 * opened is reported by /api/health as 503 rather than crashing the server), the production
 * gate, then the session: `locals.user` for pages and routes, and the sign-in requirement for
 * everything but the public paths (src/lib/auth/public-paths.ts).
 */
export const onRequest = defineMiddleware(async (context, next) => {
  context.locals.user = null;
  context.locals.sessionId = null;
  const path = context.url.pathname;
  if (isStaticAsset(path)) return next();
  try {
    await ensureMigrated();
  } catch (err) {
    console.error('Database not ready:', err instanceof Error ? err.message : err);
    return next();
  }
  const blockers = await productionBlockers();
  if (blockers.length) {
    const message = `Loopwright refuses to serve in production: ${blockers.join(' ')}`;
    return Response.json({ error: { code: 'not_configured', message } }, { status: 503 });
  }
  if (isSessionFree(path) || path.startsWith('/api/auth/')) return next();

  const { user, sessionId } = await sessionFromHeaders(context.request.headers);
  context.locals.user = user;
  context.locals.sessionId = sessionId;
  if (user || isPublicPath(path)) return next();
  if (path.startsWith('/api/')) return unauthenticated();
  const target = `/sign-in?next=${encodeURIComponent(path + context.url.search)}`;
  return context.redirect(target, 302);
});
