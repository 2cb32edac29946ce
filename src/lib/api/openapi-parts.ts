import type { z } from 'zod';
import type { ZodOpenApiOperationObject, ZodOpenApiResponseObject, ZodOpenApiResponsesObject } from 'zod-openapi';
import { ErrorBodySchema } from './schemas/error';

/** A JSON request body from a zod schema, with one worked example. */
export function jsonBody(schema: z.ZodType, example?: unknown): NonNullable<ZodOpenApiOperationObject['requestBody']> {
  const media = example === undefined ? { schema } : { schema, example };
  return { required: true, content: { 'application/json': media } };
}

/** A JSON response from a zod schema. */
export function jsonResponse(description: string, schema: z.ZodType): ZodOpenApiResponseObject {
  return { description, content: { 'application/json': { schema } } };
}

const ERROR_MEANINGS: Record<number, string> = {
  400: 'Bad request: code invalid_json, invalid_model or invalid_request, with the field to change.',
  401: 'No session: code unauthenticated.',
  403: 'The role may not do this: code forbidden.',
  404: 'No such resource: code not_found.',
  405: 'Wrong method: code method_not_allowed (see the Allow header).',
  409: 'Conflict: code conflict, invalid_transition or read_only.',
  413: 'Body over 1 MB: code body_too_large.',
  415: 'Body not sent as application/json: code unsupported_media_type.',
  422: 'A valid-looking request the engine could not complete: code calculation_failed.',
  429: 'Too many requests from this client: code rate_limited; wait Retry-After seconds.',
};

/** The contract's error body for each listed status. */
export function errorResponses(...statuses: number[]): ZodOpenApiResponsesObject {
  const out: Record<string, ZodOpenApiResponseObject> = {};
  for (const status of statuses) {
    const response = jsonResponse(ERROR_MEANINGS[status] ?? 'Error.', ErrorBodySchema);
    if (status === 429) {
      response.headers = { 'Retry-After': { description: 'Seconds to wait.', schema: { type: 'integer' } } };
    }
    out[String(status)] = response;
  }
  return out as ZodOpenApiResponsesObject;
}
