import { badRequest, unauthenticated } from '../api/errors';
import { viewerOf, type Viewer } from './access';
import type { z } from 'zod';

/** The viewer of a read route, or the 401 to answer when sign-in is in force and nobody is signed in. */
export function readerOrResponse(locals: object): { viewer: Viewer | null; response: Response | null } {
  const { viewer, signInRequired } = viewerOf(locals);
  if (signInRequired && !viewer) return { viewer: null, response: unauthenticated('Sign in to read recipes.') };
  return { viewer, response: null };
}

/** 400 `invalid_request` naming the query parameter and what it accepts. */
export function badQuery(error: z.ZodError): Response {
  const issue = error.issues[0];
  const field = issue?.path.map(String).join('.') || undefined;
  const message = `Check the query parameter ${field ?? ''}: ${(issue?.message ?? 'invalid value').replace(/\.$/, '')}.`.replace('parameter :', 'parameters:');
  return badRequest('invalid_request', message, field);
}

/** A JSON answer that browsers and proxies must not keep (what a reader may see depends on who asks). */
export function json(body: unknown, status = 200): Response {
  return Response.json(body, { status, headers: { 'Cache-Control': 'no-store' } });
}
