import { readBody, unauthenticated } from '../auth/http';
import type { Actor } from './actor';
import { EditorialError } from './errors';

/** The contract's error body, with any extra top-level keys (a conflict's `current`). */
export function errorResponse(err: EditorialError): Response {
  const error = err.field ? { code: err.code, message: err.message, field: err.field } : { code: err.code, message: err.message };
  return Response.json({ error, ...err.extra }, { status: err.status, headers: { 'Cache-Control': 'no-store' } });
}

/** A JSON answer that must not be cached (what it holds depends on who asks). */
export function json(body: unknown, status = 200): Response {
  return Response.json(body, { status, headers: { 'Cache-Control': 'no-store' } });
}

/**
 * Runs an editorial route for a signed-in person: 401 without a session, the operation's
 * refusals as their 4xx answers. Anything else is a fault of the server and is rethrown.
 */
export async function editorialRoute(locals: App.Locals, run: (actor: Actor) => Promise<Response>): Promise<Response> {
  const actor = locals.user;
  if (!actor) return unauthenticated();
  try {
    return await run(actor);
  } catch (err) {
    if (err instanceof EditorialError) return errorResponse(err);
    throw err;
  }
}

/** The request body checked by `schema`, or throws the 400 to answer (invalid_json / invalid_request with field). */
export async function bodyOf<T>(request: Request, schema: Parameters<typeof readBody<T>>[1]): Promise<T> {
  const { data, response } = await readBody(request, schema);
  if (response) {
    const { error } = (await response.json()) as { error: { code: string; message: string; field?: string } };
    throw new EditorialError(400, error.code, error.message, error.field ?? null);
  }
  return data as T;
}

/** A positive whole number from a route or query parameter, or a 400 naming it. */
export function whole(value: string | null | undefined, name: string): number {
  const n = Number(value);
  if (!value || !Number.isInteger(n) || n < 1) throw new EditorialError(400, 'invalid_request', `${name} must be a whole number from 1 up.`, name);
  return n;
}
