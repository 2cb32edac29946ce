import { z } from 'zod';
import { DiscretizeRequestSchema as EngineDiscretizeRequestSchema } from '../../control/discretize';
import { ProperTransferFunctionSchema } from './transfer-function';

/**
 * The body of POST /api/v1/calc/discretize: the engine's schema with the model checks of the
 * calculation routes on `tf`, refusing unknown keys. The engine refuses a dead time that is not
 * a whole number of samples (within 1e-9 relative) with invalid_request at `tf.delay`.
 */
export const DiscretizeRequestSchema = EngineDiscretizeRequestSchema.extend({ tf: ProperTransferFunctionSchema })
  .strict()
  .meta({ id: 'DiscretizeRequest' });

export type DiscretizeRequest = z.output<typeof DiscretizeRequestSchema>;

/** The answer: descending powers of z, den[0] = 1, and the dead time in whole samples. */
export const DiscretizeResponseSchema = z
  .looseObject({
    num: z.array(z.number()),
    den: z.array(z.number()),
    /** Dead time as a whole number of samples. */
    delaySamples: z.int().min(0),
  })
  .meta({ id: 'DiscretizeResponse' });
