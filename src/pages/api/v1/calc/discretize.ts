import { calcRoute, modelRoots } from '../../../../lib/api/calc-route';
import { DiscretizeRequestSchema } from '../../../../lib/api/schemas/discretize';
import { discretize } from '../../../../lib/control/discretize';

/** POST /api/v1/calc/discretize — ZOH or Tustin equivalent in z (contract: shared/api-v1.md). */
export const { POST, ALL } = calcRoute({
  name: 'discretize',
  schema: DiscretizeRequestSchema,
  codeFor: modelRoots('tf'),
  run: (request) => discretize(request),
});
