import { calcRoute, modelRoots } from '../../../../lib/api/calc-route';
import { IdentifyRequestSchema } from '../../../../lib/api/schemas/identify';
import { identify } from '../../../../lib/control/identify';

/** POST /api/v1/calc/identify — fits a model to an open-loop step test (contract: shared/api-v1.md). */
export const { POST, ALL } = calcRoute({
  name: 'identify',
  schema: IdentifyRequestSchema,
  codeFor: modelRoots(),
  run: (request) => identify(request),
});
