import { z } from 'zod';
import { ClaimSchema, PidControllerSchema, ProcessModelSchema, TransferFunctionSchema } from '../../schemas';

/** A short caption shown above a calculator. */
const Caption = z.string().trim().min(1).max(120);

/**
 * The only elements an authored body may use: the calculator islands, each with a strict props
 * schema (unknown props are refused). Add a component here and in the client hydrator's map
 * (src/components/authored/hydrate-islands.ts) to allow it; DEVELOPERS.md, "Editorial", says how.
 */
export const ALLOWED_COMPONENTS = {
  LoopResponse: z.strictObject({
    /** Process model the loop closes around. */
    model: ProcessModelSchema,
    /** Controller tuning shown at first. */
    controller: PidControllerSchema,
    /** Performance claims shown pass/fail. */
    claims: z.array(ClaimSchema).max(20).optional(),
    /** Measurement path H(s). */
    sensor: TransferFunctionSchema.optional(),
    /** Caption above the plot. */
    title: Caption.optional(),
  }),
  FrequencyView: z.strictObject({
    model: ProcessModelSchema,
    controller: PidControllerSchema.optional(),
    sensor: TransferFunctionSchema.optional(),
    title: Caption.optional(),
  }),
  TuningComparison: z.strictObject({
    model: ProcessModelSchema,
    /** PI or PID rules. */
    controller: z.enum(['pi', 'pid']).optional(),
    /** Rules to compare (the contract's rule names). */
    rules: z.array(z.enum(['simc', 'lambda', 'imc', 'zn-open-loop', 'cohen-coon', 'amigo'])).max(10).optional(),
    title: Caption.optional(),
  }),
  BlockChain: z.strictObject({
    /** Blocks in series, actuator to sensor, each a transfer function. */
    blocks: z.array(TransferFunctionSchema.extend({ label: Caption.optional() }).strict()).min(1).max(12),
    title: Caption.optional(),
  }),
  PidConverter: z.strictObject({
    controller: PidControllerSchema,
    title: Caption.optional(),
  }),
  Discretizer: z.strictObject({
    /** Continuous transfer function to discretize. */
    tf: TransferFunctionSchema,
    /** Sample time, s. */
    ts: z.number().positive(),
    method: z.enum(['zoh', 'tustin']).optional(),
    title: Caption.optional(),
  }),
} as const;

export type AllowedComponentName = keyof typeof ALLOWED_COMPONENTS;

export const ALLOWED_COMPONENT_NAMES = Object.keys(ALLOWED_COMPONENTS) as AllowedComponentName[];

/** Whether `name` is one of the calculator islands a body may use. */
export function isAllowedComponent(name: string | null | undefined): name is AllowedComponentName {
  return typeof name === 'string' && Object.hasOwn(ALLOWED_COMPONENTS, name);
}
