import { z } from 'zod';
import { FopdtSchema, IpdtSchema, SopdtSchema } from '../../schemas/process-model';

/** A positive, finite time in s. */
const seconds = z.number().positive();

/** The loop's ultimate point from a relay or a gain-increase test. */
export const UltimateSchema = z.object({
  type: z.literal('ultimate'),
  /** Ultimate gain Ku: the proportional gain at sustained oscillation. */
  ku: z.number().positive(),
  /** Ultimate period Pu in s. */
  pu: seconds,
});

export const TuningModelSchema = z.discriminatedUnion('type', [
  FopdtSchema,
  SopdtSchema,
  IpdtSchema,
  UltimateSchema,
]);
export type TuningModel = z.infer<typeof TuningModelSchema>;

export const RuleIdSchema = z.enum([
  'simc',
  'lambda',
  'imc',
  'zn-open-loop',
  'zn-ultimate',
  'cohen-coon',
  'amigo',
]);
export type RuleId = z.infer<typeof RuleIdSchema>;

export const ControllerKindSchema = z.enum(['pi', 'pid']);
export type ControllerKind = z.infer<typeof ControllerKindSchema>;

export const TuneOptionsSchema = z
  .object({
    /** SIMC closed-loop time constant τc in s (default θ). */
    tauC: seconds.optional(),
    /** Lambda / IMC closed-loop time constant λ in s (default τ). */
    lambda: seconds.optional(),
  })
  .strict();
export type TuneOptions = z.infer<typeof TuneOptionsSchema>;

/** The body of POST /api/v1/calc/tune. */
export const TuneRequestSchema = z.object({
  model: TuningModelSchema,
  rule: RuleIdSchema,
  controller: ControllerKindSchema,
  options: TuneOptionsSchema.optional(),
});
export type TuneRequest = z.infer<typeof TuneRequestSchema>;

/** A tuned controller as the contract returns it; td is 0 for PI. Times in s. */
export const TunedControllerSchema = z.object({
  /** ideal: kc·(1 + 1/(ti·s) + td·s); series: kc·(1 + 1/(ti·s))·(1 + td·s). */
  form: z.enum(['ideal', 'series']),
  /** Controller gain, output units per measurement unit. */
  kc: z.number(),
  /** Integral time in s. */
  ti: z.number(),
  /** Derivative time in s (0 = none). */
  td: z.number(),
});
export type TunedController = z.infer<typeof TunedControllerSchema>;

export interface TuneResult {
  controller: TunedController;
  rule: RuleId;
  /** The publication the formulas come from. */
  source: string;
}

/** A comparison of every applicable rule for one process model. */
export const CompareRequestSchema = z.object({
  /** The process model the rules tune and the figures are predicted on. */
  model: z.discriminatedUnion('type', [FopdtSchema, SopdtSchema, IpdtSchema]),
  controller: ControllerKindSchema,
  options: TuneOptionsSchema.optional(),
  /** Derivative filter divisor for the predicted loops (filter time td/n); default 10. */
  n: z.number().positive().max(1000).optional(),
});
export type CompareRequest = z.input<typeof CompareRequestSchema>;
