import type { ZodOpenApiPathsObject } from 'zod-openapi';
import { errorResponses, jsonResponse } from '../openapi-parts';
import { SearchQuerySchema, SearchResponseSchema } from '../schemas/search';

/** The recipe library's search (shared/api-v1.md, "Recipes and accounts"). */
export const searchPaths: ZodOpenApiPathsObject = {
  '/api/v1/search': {
    get: {
      operationId: 'searchRecipes',
      summary: 'Published recipes that match the words, best first (any signed-in user); a recipe is findable as soon as its publish call has answered.',
      tags: ['recipes'],
      requestParams: { query: SearchQuerySchema },
      responses: {
        '200': jsonResponse('At most 50 hits, best first.', SearchResponseSchema),
        ...errorResponses(400, 401),
      },
    },
  },
};
