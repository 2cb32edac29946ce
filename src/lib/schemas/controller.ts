import { z } from 'zod';

const Time = z.number().min(0);

/** C = kc·(1 + 1/(ti·s) + td·s/(1 + (td/n)·s)); ti, td in s; ti 0 or absent = no integral. */
export const IdealPidSchema = z.object({
  form: z.literal('ideal'),
  /** Controller gain, plain ratio (output units per input unit). */
  kc: z.number(),
  /** Integral time, s. */
  ti: Time.optional(),
  /** Derivative time, s. */
  td: Time.optional(),
  /** Derivative filter divisor (filter time td/n); default 10. */
  n: z.number().positive().optional(),
});

/** C = kc·(1 + 1/(ti·s))·(1 + td·s)/(1 + (td/n)·s) — the interacting form of many PLCs. */
export const SeriesPidSchema = IdealPidSchema.extend({ form: z.literal('series') });

/** C = kp + ki/s + kd·s/(1 + tf·s). */
export const ParallelPidSchema = z.object({
  form: z.literal('parallel'),
  /** Proportional gain, plain ratio. */
  kp: z.number(),
  /** Integral gain, 1/s. */
  ki: z.number().optional(),
  /** Derivative gain, s. */
  kd: z.number().optional(),
  /** Derivative filter time constant, s; 0 = no filter. */
  tf: Time.optional(),
});

/** A PID controller in one of the contract's three forms. */
export const PidControllerSchema = z.discriminatedUnion('form', [IdealPidSchema, SeriesPidSchema, ParallelPidSchema]);

export type PidControllerInput = z.infer<typeof PidControllerSchema>;
