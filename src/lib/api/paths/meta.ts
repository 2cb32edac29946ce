import { z } from 'zod';
import type { ZodOpenApiPathsObject } from 'zod-openapi';
import { jsonResponse } from '../openapi-parts';

/** The document itself. */
export const metaPaths: ZodOpenApiPathsObject = {
  '/api/v1/openapi.json': {
    get: {
      operationId: 'openapi',
      summary: 'This OpenAPI 3.1 document.',
      tags: ['meta'],
      security: [],
      responses: { '200': jsonResponse('The OpenAPI document.', z.record(z.string(), z.unknown())) },
    },
  },
};
