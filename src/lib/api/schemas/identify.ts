import { z } from 'zod';

/** Fewest samples a step test may have (the contract's floor). */
export const MIN_SAMPLES = 10;
/** Most samples one step test may have. */
export const MAX_SAMPLES = 100_000;

const Samples = z.array(z.number()).min(MIN_SAMPLES).max(MAX_SAMPLES);

/**
 * The body of POST /api/v1/calc/identify: an open-loop step test. `t` strictly increasing (s),
 * `y` the measured PV, `u` the controller output (a single step; a unit step at t = 0 when absent).
 */
export const IdentifyRequestSchema = z
  .object({
    /** Sample times, s, strictly increasing. */
    t: Samples,
    /** Measured process value at each time, in PV units. */
    y: Samples,
    /** Controller output at each time (one step), in MV units. */
    u: Samples.optional(),
    /** The model to fit. */
    model: z.enum(['fopdt', 'sopdt', 'ipdt']),
  })
  .strict()
  .superRefine((req, ctx) => {
    const at = req.t.findIndex((ti, i) => i > 0 && !(ti > req.t[i - 1]!));
    if (at > 0) {
      ctx.addIssue({
        code: 'custom',
        path: ['t', at],
        message: `Sample times must increase: t[${at}] = ${req.t[at]} does not come after t[${at - 1}] = ${req.t[at - 1]}; sort the samples and drop duplicates.`,
      });
    }
    for (const key of ['y', 'u'] as const) {
      const values = req[key];
      if (values && values.length !== req.t.length) {
        ctx.addIssue({
          code: 'custom',
          path: [key],
          message: `${key} has ${values.length} samples but t has ${req.t.length}; give one value per sample time.`,
        });
      }
    }
    if (req.u && req.u.every((v) => v === req.u![0])) {
      ctx.addIssue({ code: 'custom', path: ['u'], message: 'u never changes, so there is no step to fit; give the controller output of the test.' });
    }
  })
  .meta({ id: 'IdentifyRequest' });

export type IdentifyRequest = z.output<typeof IdentifyRequestSchema>;

/** The answer of POST /api/v1/calc/identify. Times in s; k a plain ratio (ipdt: 1/s). */
export const IdentifyResponseSchema = z
  .object({
    model: z.discriminatedUnion('type', [
      z.object({ type: z.literal('fopdt'), k: z.number(), tau: z.number(), theta: z.number() }),
      z.object({ type: z.literal('sopdt'), k: z.number(), tau1: z.number(), tau2: z.number(), theta: z.number() }),
      z.object({ type: z.literal('ipdt'), k: z.number(), theta: z.number() }),
    ]),
    fit: z.object({
      /** Root-mean-square error of the fit, PV units. */
      rmse: z.number(),
      /** Coefficient of determination. */
      r2: z.number(),
    }),
  })
  .meta({ id: 'IdentifyResponse' });
