import { z } from 'zod';
import { ProperTransferFunctionSchema } from './transfer-function';

/** How close (relative) delay/ts must be to a whole number of samples. */
export const WHOLE_SAMPLE_TOLERANCE = 1e-9;

/** The whole number of samples in `delay`, or null when it is not within the tolerance of one. */
export function wholeSamples(delay: number, ts: number): number | null {
  const ratio = delay / ts;
  const nearest = Math.round(ratio);
  return Math.abs(ratio - nearest) <= WHOLE_SAMPLE_TOLERANCE * Math.max(1, Math.abs(ratio)) ? nearest : null;
}

/** The body of POST /api/v1/calc/discretize. */
export const DiscretizeRequestSchema = z
  .object({
    /** The continuous transfer function; its delay must be a whole number of samples. */
    tf: ProperTransferFunctionSchema,
    /** Sample time, s. */
    ts: z.number().positive(),
    /** Zero-order hold or the bilinear (Tustin) transform. */
    method: z.enum(['zoh', 'tustin']),
  })
  .strict()
  .superRefine((req, ctx) => {
    if (wholeSamples(req.tf.delay, req.ts) === null) {
      const samples = req.tf.delay / req.ts;
      ctx.addIssue({
        code: 'custom',
        params: { code: 'invalid_request' },
        path: ['tf', 'delay'],
        message: `The dead time is ${samples.toPrecision(6)} samples; choose ts so that delay/ts is a whole number (or round the delay).`,
      });
    }
  })
  .meta({ id: 'DiscretizeRequest' });

export type DiscretizeRequest = z.output<typeof DiscretizeRequestSchema>;

/** The answer: descending powers of z, den[0] = 1, and the dead time in whole samples. */
export const DiscretizeResponseSchema = z
  .object({
    num: z.array(z.number()),
    den: z.array(z.number()),
    /** Dead time as a whole number of samples. */
    delaySamples: z.int().min(0),
  })
  .meta({ id: 'DiscretizeResponse' });
