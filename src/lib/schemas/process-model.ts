import { z } from 'zod';
import { TransferFunctionSchema } from './transfer-function';

/** Process gain, plain ratio of PV change to MV change (in the units the recipe states). */
const Gain = z.number().refine((k) => k !== 0, 'The process gain cannot be 0.');
/** A time constant in s, > 0. */
const TimeConstant = z.number().positive();
/** Dead time in s, ≥ 0. */
const DeadTime = z.number().min(0);

/** K·e^(−θs)/(τs+1). */
export const FopdtSchema = z.object({ type: z.literal('fopdt'), k: Gain, tau: TimeConstant, theta: DeadTime });
/** K·e^(−θs)/((τ1 s+1)(τ2 s+1)), τ1 ≥ τ2. */
export const SopdtSchema = z
  .object({ type: z.literal('sopdt'), k: Gain, tau1: TimeConstant, tau2: TimeConstant, theta: DeadTime })
  .refine((m) => m.tau1 >= m.tau2, { message: 'tau1 must be at least tau2.', path: ['tau1'] });
/** K·e^(−θs)/s, k the slope gain (PV units per s per MV unit). */
export const IpdtSchema = z.object({ type: z.literal('ipdt'), k: Gain, theta: DeadTime });
/** Any other process, as a transfer function. */
export const TfModelSchema = TransferFunctionSchema.extend({ type: z.literal('tf') });

/** The process model of a recipe or a fit: a low-order model or a full transfer function. */
export const ProcessModelSchema = z.union([FopdtSchema, SopdtSchema, IpdtSchema, TfModelSchema]);

export type ProcessModelInput = z.infer<typeof ProcessModelSchema>;
