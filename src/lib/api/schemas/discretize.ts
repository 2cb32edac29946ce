import { z } from 'zod';
import { DiscretizeRequestSchema as EngineDiscretizeRequestSchema, MAX_DELAY_SAMPLES } from '../../control/discretize';
import { reasonableMagnitude } from './magnitude';
import { ProperTransferFunctionSchema } from './transfer-function';

export { MAX_DELAY_SAMPLES };

/**
 * The body of POST /api/v1/calc/discretize: the engine's schema with the model checks of the
 * calculation routes on `tf`, refusing unknown keys. The engine refuses a dead time that is not
 * a whole number of samples (within 1e-9 relative) with invalid_request at `tf.delay`.
 */
export const DiscretizeRequestSchema = EngineDiscretizeRequestSchema.extend({
  tf: ProperTransferFunctionSchema,
  /** Sample time, s. */
  ts: z.number().positive().refine(reasonableMagnitude, 'The sample time must lie within 1e-100 to 1e100 s.'),
})
  .strict()
  .superRefine((req, ctx) => {
    if (!(req.tf.delay / req.ts <= MAX_DELAY_SAMPLES)) {
      ctx.addIssue({
        code: 'custom',
        params: { code: 'invalid_request' },
        path: ['tf', 'delay'],
        message: `The dead time is more than ${MAX_DELAY_SAMPLES.toLocaleString('en-US')} samples of ts; choose a longer sample time.`,
      });
    }
  })
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
