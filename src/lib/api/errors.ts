/**
 * The contract's error body, `{ "error": { "code", "message", "field"? } }`, and one helper per
 * status the API answers with. `message` is one plain sentence the caller can act on; `field`
 * is a dotted path into the request (`plant.1.den.0`).
 */

/** What goes inside `error`. Extra top-level keys (e.g. `current` on a 409) go in `extra`. */
export interface ApiErrorDetail {
  code: string;
  message: string;
  field?: string;
}

/** A failure that a handler may throw; `toResponse()` turns it into the contract's body. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly field?: string,
    readonly headers: Record<string, string> = {},
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }

  get detail(): ApiErrorDetail {
    return this.field === undefined
      ? { code: this.code, message: this.message }
      : { code: this.code, message: this.message, field: this.field };
  }

  toResponse(): Response {
    return errorResponse(this.status, this.detail, this.headers, this.extra);
  }
}

/** A JSON response carrying the error body; never cached. */
export function errorResponse(
  status: number,
  detail: ApiErrorDetail,
  headers: Record<string, string> = {},
  extra: Record<string, unknown> = {},
): Response {
  return Response.json(
    { ...extra, error: detail },
    { status, headers: { 'Cache-Control': 'no-store', ...headers } },
  );
}

/** 400: codes `invalid_json`, `invalid_model`, `invalid_request`, or a route's own. */
export function badRequest(code: string, message: string, field?: string): Response {
  return new ApiError(400, code, message, field).toResponse();
}

/** 401 `unauthenticated`: a session is needed. */
export function unauthenticated(message = 'Sign in to use this route.'): Response {
  return new ApiError(401, 'unauthenticated', message).toResponse();
}

/** 403 `forbidden`: the signed-in role may not do this. */
export function forbidden(message = 'Your role may not do this; ask a curator or an admin.'): Response {
  return new ApiError(403, 'forbidden', message).toResponse();
}

/** 404 `not_found`. */
export function notFound(message = 'Nothing exists at this address.'): Response {
  return new ApiError(404, 'not_found', message).toResponse();
}

/** 405 `method_not_allowed` with the `Allow` header. */
export function methodNotAllowed(allowed: readonly string[]): Response {
  const list = allowed.join(', ');
  return new ApiError(405, 'method_not_allowed', `This route answers ${list} only.`, undefined, {
    Allow: list,
  }).toResponse();
}

/** 409: `conflict` by default; `extra` adds top-level keys such as `current`. */
export function conflict(message: string, extra: Record<string, unknown> = {}, code = 'conflict'): Response {
  return new ApiError(409, code, message, undefined, {}, extra).toResponse();
}

/** 413 `body_too_large`. */
export function payloadTooLarge(limitBytes: number): Response {
  return new ApiError(413, 'body_too_large', tooLargeMessage(limitBytes)).toResponse();
}

export function tooLargeMessage(limitBytes: number): string {
  return `The request body is larger than ${Math.round(limitBytes / 1024)} KB; send fewer points or split the request.`;
}

/** 415 `unsupported_media_type`. */
export function unsupportedMediaType(): Response {
  return new ApiError(415, 'unsupported_media_type', UNSUPPORTED_MEDIA_MESSAGE).toResponse();
}

export const UNSUPPORTED_MEDIA_MESSAGE =
  'Send the body as JSON with the header Content-Type: application/json.';

/** 429 `rate_limited` with `Retry-After` in whole seconds. */
export function rateLimited(retryAfterSeconds: number): Response {
  const wait = Math.max(1, Math.ceil(retryAfterSeconds));
  return new ApiError(
    429,
    'rate_limited',
    `Too many calculation requests from this address; wait ${wait} s and try again.`,
    undefined,
    { 'Retry-After': String(wait) },
  ).toResponse();
}

/** 422 `calculation_failed`: the request looked valid but the engine could not finish it. */
export function calculationFailed(
  message = 'The calculation could not be completed for this input; check the model for extreme values and try again.',
): Response {
  return new ApiError(422, 'calculation_failed', message).toResponse();
}
