import { z } from 'zod';
import { IdentifyRequestSchema as EngineIdentifyRequestSchema } from '../../control/identify';

/**
 * The body of POST /api/v1/calc/identify: the engine's step-test schema, refusing unknown keys.
 * The engine checks the rest (increasing t, equal lengths, a single step in u) and names the field.
 */
export const IdentifyRequestSchema = EngineIdentifyRequestSchema.strict().meta({
  id: 'IdentifyRequest',
  description: 'An open-loop step test: t in s (strictly increasing, at least 10 samples), y the PV, u the controller output.',
});

export type IdentifyRequest = z.output<typeof IdentifyRequestSchema>;

/** The answer of POST /api/v1/calc/identify. Times in s; k a plain ratio (ipdt: 1/s). */
export const IdentifyResponseSchema = z
  .looseObject({
    model: z.discriminatedUnion('type', [
      z.looseObject({ type: z.literal('fopdt'), k: z.number(), tau: z.number(), theta: z.number() }),
      z.looseObject({ type: z.literal('sopdt'), k: z.number(), tau1: z.number(), tau2: z.number(), theta: z.number() }),
      z.looseObject({ type: z.literal('ipdt'), k: z.number(), theta: z.number() }),
    ]),
    fit: z.looseObject({
      /** Root-mean-square error of the fit, PV units. */
      rmse: z.number(),
      /** Coefficient of determination. */
      r2: z.number(),
    }),
  })
  .meta({ id: 'IdentifyResponse' });
