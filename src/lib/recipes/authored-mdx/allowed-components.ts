import { z } from 'zod';
import { BlockSchema, ClaimSchema, FopdtSchema, IpdtSchema, PidControllerSchema, ProcessModelSchema, SopdtSchema, TransferFunctionSchema } from '../../schemas';
import type { AllowedComponentName } from './component-names';

export { ALLOWED_COMPONENT_NAMES, type AllowedComponentName } from './component-names';

/** A short caption shown above a calculator. */
const Caption = z.string().trim().min(1).max(120);
/** Names a calculator's URL parameter when a page has several of one kind. */
const InstanceId = z.string().regex(/^[a-z][a-z0-9-]{0,39}$/, 'An id is lower-case letters, digits and hyphens.');

/**
 * The only elements an authored body may use: the calculator islands (src/components/calculators),
 * each with a strict props schema mirroring the island's props (unknown props are refused).
 * DEVELOPERS.md, "Editorial", says how to allow another one.
 */
export const ALLOWED_COMPONENTS: Record<AllowedComponentName, z.ZodType> = {
  LoopResponse: z.strictObject({
    /** Process model the loop closes around. */
    model: ProcessModelSchema,
    /** Controller tuning shown at first. */
    controller: PidControllerSchema,
    /** Measurement path H(s). */
    sensor: TransferFunctionSchema.optional(),
    /** Performance claims shown pass/fail. */
    claims: z.array(ClaimSchema).max(20).optional(),
    /** Horizon of the step responses, s. */
    tFinal: z.number().positive().max(1e6).optional(),
    id: InstanceId.optional(),
    title: Caption.optional(),
  }),
  FrequencyView: z.strictObject({
    model: ProcessModelSchema,
    controller: PidControllerSchema,
    sensor: TransferFunctionSchema.optional(),
    id: InstanceId.optional(),
    title: Caption.optional(),
  }),
  TuningComparison: z.strictObject({
    /** The model the rules tune: first or second order with dead time, or integrating. */
    model: z.union([FopdtSchema, SopdtSchema, IpdtSchema]),
    /** Which controller the rules design. */
    controller: z.enum(['pi', 'pid']),
    id: InstanceId.optional(),
    title: Caption.optional(),
  }),
  BlockChain: z.strictObject({
    /** The forward path in signal order (actuator → process → …). */
    blocks: z.array(BlockSchema).min(1).max(12),
    /** The measurement block. */
    sensor: BlockSchema.optional(),
    id: InstanceId.optional(),
    title: Caption.optional(),
  }),
  PidConverter: z.strictObject({
    controller: PidControllerSchema,
    id: InstanceId.optional(),
    title: Caption.optional(),
  }),
  Discretizer: z.strictObject({
    /** Continuous transfer function to discretize. */
    tf: TransferFunctionSchema,
    /** Sample time, s. */
    ts: z.number().positive(),
    /** A PID to print as a difference equation. */
    controller: PidControllerSchema.optional(),
    id: InstanceId.optional(),
    title: Caption.optional(),
  }),
};

/** Whether `name` is one of the calculator islands a body may use. */
export function isAllowedComponent(name: string | null | undefined): name is AllowedComponentName {
  return typeof name === 'string' && Object.hasOwn(ALLOWED_COMPONENTS, name);
}
