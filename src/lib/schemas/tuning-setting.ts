import { z } from 'zod';

/**
 * PID settings as they are entered in the plant's controller, with their form and units — what
 * the loop register and evidence record. `toPidController` (fielddata/tuning-setting) turns
 * them into the contract's units (seconds, plain ratios).
 */
export const TuningSettingSchema = z.object({
  /** Controller form: ideal, series (interacting) or parallel, as defined in the API contract. */
  form: z.enum(['ideal', 'series', 'parallel']),
  /** kc for ideal and series, kp for parallel; a plain ratio in `gainUnit`. */
  gain: z.number().refine(Number.isFinite, 'The gain must be a finite number.'),
  /** ti in `timeUnit` (ideal, series) or ki in 1/`timeUnit` (parallel); null = no integral action. */
  integral: z.number().min(0, 'The integral setting cannot be negative.').nullable(),
  /** td in `timeUnit` (ideal, series) or kd in `timeUnit` (parallel); null = no derivative action. */
  derivative: z.number().min(0, 'The derivative setting cannot be negative.').nullable(),
  /** Unit of the time settings on the controller: seconds or minutes. */
  timeUnit: z.enum(['s', 'min']),
  /** What the gain relates, e.g. "%/%" (spans) or "%/°C"; a label, not converted. */
  gainUnit: z.string().trim().min(1).max(24).default('%/%'),
});

export type TuningSetting = z.infer<typeof TuningSettingSchema>;
