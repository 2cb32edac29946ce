import { z } from 'zod';
import { IdentifyRequestSchema as EngineIdentifyRequestSchema } from '../../control/identify';
import { magnitudeMessage, reasonableMagnitude } from './magnitude';

/**
 * The body of POST /api/v1/calc/identify: the engine's step-test schema, refusing unknown keys.
 * The engine checks the rest (increasing t, equal lengths, a single step in u) and names the field.
 */
export const IdentifyRequestSchema = EngineIdentifyRequestSchema.strict()
  .superRefine((req, ctx) => {
    for (const key of ['t', 'y', 'u'] as const) {
      const values = req[key] ?? [];
      const at = values.findIndex((v) => !reasonableMagnitude(v));
      if (at >= 0) {
        ctx.addIssue({ code: 'custom', path: [key, at], message: magnitudeMessage(values[at]!) });
        return;
      }
    }
  })
  .meta({
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
