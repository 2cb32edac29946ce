import { hasRole, type Role } from './roles';
import type { SessionUser } from './session-user';
import { forbidden, unauthenticated } from './http';

/** What a route learns from a role check: the user, or the response to send instead. */
export type RoleCheck = { user: SessionUser; response: null } | { user: null; response: Response };

/**
 * For API routes: `const { user, response } = requireRole(context, 'author'); if (response) return response;`
 * answers 401 without a session and 403 below `min`, with the contract's bodies.
 */
export function requireRole(context: { locals: App.Locals }, min: Role): RoleCheck {
  const user = context.locals.user;
  if (!user) return { user: null, response: unauthenticated() };
  if (!hasRole(user, min)) return { user: null, response: forbidden(min) };
  return { user, response: null };
}

/** For pages: whether the signed-in person may see it; sets the 403 status when not. */
export function pageAccess(astro: { locals: App.Locals; response: { status?: number } }, min: Role): { user: SessionUser | null; allowed: boolean } {
  const user = astro.locals.user;
  const allowed = hasRole(user, min);
  if (!allowed) astro.response.status = user ? 403 : 401;
  return { user, allowed };
}
