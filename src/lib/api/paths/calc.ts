import type { z } from 'zod';
import type { ZodOpenApiOperationObject, ZodOpenApiPathsObject } from 'zod-openapi';
import { analyzeExample, discretizeExample, identifyExample, tuneExample } from '../examples';
import { errorResponses, jsonBody, jsonResponse } from '../openapi-parts';
import { AnalyzeRequestSchema } from '../schemas/analyze';
import { AnalyzeResponseSchema } from '../schemas/analyze-response';
import { DiscretizeRequestSchema, DiscretizeResponseSchema } from '../schemas/discretize';
import { IdentifyRequestSchema, IdentifyResponseSchema } from '../schemas/identify';
import { TuneRequestSchema, TuneResponseSchema } from '../schemas/tune';

function calcOperation(
  operationId: string,
  summary: string,
  request: z.ZodType,
  example: unknown,
  response: z.ZodType,
): ZodOpenApiOperationObject {
  return {
    operationId,
    summary,
    tags: ['calculation'],
    security: [],
    requestBody: jsonBody(request, example),
    responses: {
      '200': jsonResponse('The result.', response),
      ...errorResponses(400, 405, 413, 415, 422, 429),
    },
  };
}

/** The four calculation routes: public, rate-limited per client. */
export const calcPaths: ZodOpenApiPathsObject = {
  '/api/v1/calc/analyze': {
    post: calcOperation(
      'analyze',
      'Step, frequency response, margins, poles and stability of a loop or an open path.',
      AnalyzeRequestSchema,
      analyzeExample,
      AnalyzeResponseSchema,
    ),
  },
  '/api/v1/calc/tune': {
    post: calcOperation('tune', 'PI or PID settings from a published tuning rule.', TuneRequestSchema, tuneExample, TuneResponseSchema),
  },
  '/api/v1/calc/identify': {
    post: calcOperation(
      'identify',
      'Fits an fopdt, sopdt or ipdt model to an open-loop step test.',
      IdentifyRequestSchema,
      identifyExample,
      IdentifyResponseSchema,
    ),
  },
  '/api/v1/calc/discretize': {
    post: calcOperation(
      'discretize',
      'Discrete-time transfer function by zero-order hold or Tustin.',
      DiscretizeRequestSchema,
      discretizeExample,
      DiscretizeResponseSchema,
    ),
  },
};
