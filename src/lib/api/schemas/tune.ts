import { z } from 'zod';
import {
  RuleIdSchema,
  TunedControllerSchema,
  TuneRequestSchema as EngineTuneRequestSchema,
} from '../../control/tuning/schema';

/** The body of POST /api/v1/calc/tune: the engine's schema, refusing unknown top-level keys. */
export const TuneRequestSchema = EngineTuneRequestSchema.strict().meta({
  id: 'TuneRequest',
  description: 'A process model (fopdt, sopdt, ipdt or ultimate), a published rule and PI or PID.',
});

export type TuneRequest = z.output<typeof TuneRequestSchema>;

/** The answer of POST /api/v1/calc/tune. */
export const TuneResponseSchema = z
  .looseObject({
    controller: TunedControllerSchema.loose(),
    rule: RuleIdSchema,
    /** The publication the formulas come from. */
    source: z.string(),
  })
  .meta({ id: 'TuneResponse' });
