import { getAuth } from './auth';
import { toSessionUser, type SessionUser } from './session-user';

/** The person a request's session cookie belongs to, or nulls when there is none or it has ended. */
export async function sessionFromHeaders(headers: Headers): Promise<{ user: SessionUser | null; sessionId: string | null }> {
  try {
    const found = await getAuth().api.getSession({ headers });
    if (!found || (found.user as { banned?: boolean | null }).banned) return { user: null, sessionId: null };
    return { user: toSessionUser(found.user), sessionId: found.session.id };
  } catch (err) {
    console.error('Session lookup failed:', err instanceof Error ? err.message : err);
    return { user: null, sessionId: null };
  }
}
