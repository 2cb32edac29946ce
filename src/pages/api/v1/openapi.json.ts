import type { APIRoute } from 'astro';
import { methodNotAllowed } from '../../../lib/api/errors';
import { openApiDocument } from '../../../lib/api/openapi';

/** The OpenAPI 3.1 document of the whole API; public. */
export const GET: APIRoute = () =>
  Response.json(openApiDocument(), { headers: { 'Cache-Control': 'public, max-age=300' } });

export const ALL: APIRoute = () => methodNotAllowed(['GET']);
