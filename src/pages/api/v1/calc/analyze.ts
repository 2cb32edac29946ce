import { calcRoute, modelRoots } from '../../../../lib/api/calc-route';
import { AnalyzeRequestSchema } from '../../../../lib/api/schemas/analyze';
import { analyze } from '../../../../lib/control/analyze';

/**
 * POST /api/v1/calc/analyze — step, frequency response, margins, poles and stability of a loop
 * or an open path (contract: shared/api-v1.md).
 */
export const { POST, ALL } = calcRoute({
  name: 'analyze',
  schema: AnalyzeRequestSchema,
  codeFor: modelRoots('plant', 'sensor'),
  run: (request) => analyze(request),
});
