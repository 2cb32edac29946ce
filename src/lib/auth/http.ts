import { errorResponse, forbidden as forbiddenResponse, unauthenticated as unauthenticatedResponse } from '../api/errors';
import { ROLE_LABELS, type Role } from './roles';

/** The contract's error body: `{ error: { code, message, field? } }` (built by src/lib/api/errors.ts). */
export function jsonError(status: number, code: string, message: string, field?: string): Response {
  return errorResponse(status, field === undefined ? { code, message } : { code, message, field });
}

/** 401 for a request that needs a session and has none. */
export function unauthenticated(): Response {
  return unauthenticatedResponse('Sign in first: this needs a Loopwright account (POST /api/auth/sign-in/email).');
}

/** 403 for a signed-in person whose role may not do this. */
export function forbidden(min: Role): Response {
  return forbiddenResponse(`This needs the ${ROLE_LABELS[min].toLowerCase()} role or higher; ask an admin if you should have it.`);
}

/**
 * The request body checked against `schema`: the data, or the 400 to answer with (invalid_json /
 * invalid_request with `field`). It does not go through src/lib/api/read-json.ts: that one also
 * answers 415 to a body not declared as JSON and 413 past 1 MB, which the routes using this
 * (sign-in administration, editorial, field data) have never done.
 */
export async function readBody<T>(
  request: Request,
  schema: { safeParse(v: unknown): { success: true; data: T } | { success: false; error: { issues: { path: PropertyKey[]; message: string }[] } } },
): Promise<{ data: T; response: null } | { data: null; response: Response }> {
  let raw: unknown;
  try {
    raw = await request.json();
  } catch {
    return { data: null, response: jsonError(400, 'invalid_json', 'The body is not valid JSON: send a JSON object with Content-Type: application/json.') };
  }
  const parsed = schema.safeParse(raw);
  if (parsed.success) return { data: parsed.data, response: null };
  const issue = parsed.error.issues[0];
  const field = issue.path.map(String).join('.');
  return { data: null, response: jsonError(400, 'invalid_request', issue.message, field || undefined) };
}
