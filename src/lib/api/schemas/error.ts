import { z } from 'zod';

/** The contract's error body. */
export const ErrorBodySchema = z
  .object({
    error: z.object({
      /** Machine-readable: invalid_json, invalid_model, invalid_request, rate_limited, … */
      code: z.string(),
      /** One plain sentence saying what to change. */
      message: z.string(),
      /** Dotted path into the request, array indexes as numbers (`plant.1.den.0`). */
      field: z.string().optional(),
    }),
  })
  .meta({ id: 'ErrorBody' });
