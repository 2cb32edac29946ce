import type { APIContext, APIRoute } from 'astro';
import type { z } from 'zod';
import { ModelError } from '../control/types';
import { ApiError, calculationFailed, methodNotAllowed, rateLimited } from './errors';
import { readJson } from './read-json';
import { calcRateFromEnv, RateLimiter } from './rate-limit';
import { issueToApiError, type CodeForPath } from './zod-issues';

/** One limiter for all calculation routes: the budget is per client, not per route. */
let limiter: RateLimiter | null = null;
function calcLimiter(): RateLimiter {
  limiter ??= new RateLimiter(calcRateFromEnv());
  return limiter;
}

/** Replaces the shared limiter (tests lower the limit without restarting). */
export function resetCalcLimiter(next: RateLimiter | null = null): void {
  limiter = next;
}

export interface CalcRouteOptions<S extends z.ZodType, R> {
  /** Route name for the server log, e.g. `analyze`. */
  name: string;
  /** The request body schema (also the OpenAPI request schema). */
  schema: S;
  /** Which contract code a schema issue at a path gets (invalid_model vs invalid_request). */
  codeFor: CodeForPath;
  /** The engine call; a ModelError it throws becomes a 400 with its code and field. */
  run(input: z.output<S>): R | Promise<R>;
}

/** The address the rate limit is keyed by; direct calls without a socket share one bucket. */
function clientKey(context: Pick<APIContext, 'clientAddress'>): string {
  try {
    return context.clientAddress || 'unknown';
  } catch {
    return 'unknown';
  }
}

/**
 * POST handler of a calculation route: rate limit, JSON body (1 MB), schema, engine. Bad input
 * answers 4xx with the contract's error body; an unexpected engine failure answers 422 and is
 * logged with its stack, never sent to the caller.
 */
export function calcRoute<S extends z.ZodType, R>(options: CalcRouteOptions<S, R>): { POST: APIRoute; ALL: APIRoute } {
  const POST: APIRoute = async (context) => {
    const decision = calcLimiter().take(clientKey(context));
    if (!decision.allowed) return rateLimited(decision.retryAfterSeconds);
    try {
      const body = await readJson(context.request);
      const parsed = options.schema.safeParse(body);
      if (!parsed.success) throw issueToApiError(parsed.error, body, options.codeFor);
      const result = await options.run(parsed.data);
      return Response.json(result, { headers: { 'Cache-Control': 'no-store' } });
    } catch (err) {
      return failure(err, options.name);
    }
  };
  const ALL: APIRoute = () => methodNotAllowed(['POST']);
  return { POST, ALL };
}

function failure(err: unknown, name: string): Response {
  if (err instanceof ApiError) return err.toResponse();
  if (err instanceof ModelError) return new ApiError(400, err.code, err.message, err.field).toResponse();
  console.error(`calc/${name}: unexpected failure for a request that passed validation`, err);
  return calculationFailed();
}

/**
 * invalid_model for anything wrong with a model that was given (under one of the roots, e.g.
 * `plant`, `plant.1.den.0`); invalid_request for a missing model, an unknown key, or a `type`
 * that names a kind of model.
 */
export function modelRoots(...roots: string[]): CodeForPath {
  return (path, issue, received) => {
    if (path.length === 0 || !roots.includes(String(path[0]))) return 'invalid_request';
    const missing = path.length === 1 && received === undefined;
    const isChoice = issue.code === 'unrecognized_keys' || path[path.length - 1] === 'type';
    return missing || isChoice ? 'invalid_request' : 'invalid_model';
  };
}
