import { calcRoute, modelRoots } from '../../../../lib/api/calc-route';
import { TuneRequestSchema } from '../../../../lib/api/schemas/tune';
import { tune } from '../../../../lib/control/tuning';

/** POST /api/v1/calc/tune — PI/PID settings from a published rule (contract: shared/api-v1.md). */
export const { POST, ALL } = calcRoute({
  name: 'tune',
  schema: TuneRequestSchema,
  codeFor: modelRoots('model'),
  run: (request) => tune(request),
});
