import { z } from 'zod';

/** A positive, finite time in s. */
const seconds = z.number().finite().positive();
/** A process gain: finite and not zero (its sign sets the controller's action). */
const gain = z
  .number()
  .finite()
  .refine((k) => k !== 0, { message: 'The process gain k must not be zero.' });

/** K·e^(−θs)/(τs+1). */
export const fopdtSchema = z.object({
  type: z.literal('fopdt'),
  /** Steady-state gain, output units per input unit. */
  k: gain,
  /** Time constant τ in s, > 0. */
  tau: seconds,
  /** Dead time θ in s, ≥ 0. */
  theta: z.number().finite().nonnegative(),
});

/** K·e^(−θs)/((τ1 s+1)(τ2 s+1)) with τ1 ≥ τ2. */
export const sopdtSchema = z
  .object({
    type: z.literal('sopdt'),
    /** Steady-state gain. */
    k: gain,
    /** Dominant time constant τ1 in s. */
    tau1: seconds,
    /** Second time constant τ2 in s, ≤ τ1. */
    tau2: seconds,
    /** Dead time θ in s, ≥ 0. */
    theta: z.number().finite().nonnegative(),
  })
  .refine((m) => m.tau1 >= m.tau2, {
    message: 'tau1 must be the larger time constant (tau1 ≥ tau2).',
    path: ['tau2'],
  });

/** K·e^(−θs)/s: k is the slope gain (output units per s per input unit). */
export const ipdtSchema = z.object({
  type: z.literal('ipdt'),
  /** Slope gain in 1/s (dy/dt per unit of u). */
  k: gain,
  /** Dead time θ in s, ≥ 0. */
  theta: z.number().finite().nonnegative(),
});

/** The loop's ultimate point from a relay or a gain-increase test. */
export const ultimateSchema = z.object({
  type: z.literal('ultimate'),
  /** Ultimate gain Ku: the proportional gain at sustained oscillation. */
  ku: z.number().finite().positive(),
  /** Ultimate period Pu in s. */
  pu: seconds,
});

export const tuningModelSchema = z.discriminatedUnion('type', [
  fopdtSchema,
  sopdtSchema,
  ipdtSchema,
  ultimateSchema,
]);
export type TuningModel = z.infer<typeof tuningModelSchema>;

export const ruleIdSchema = z.enum([
  'simc',
  'lambda',
  'imc',
  'zn-open-loop',
  'zn-ultimate',
  'cohen-coon',
  'amigo',
]);
export type RuleId = z.infer<typeof ruleIdSchema>;

export const controllerKindSchema = z.enum(['pi', 'pid']);
export type ControllerKind = z.infer<typeof controllerKindSchema>;

export const tuneOptionsSchema = z
  .object({
    /** SIMC closed-loop time constant τc in s (default θ). */
    tauC: seconds.optional(),
    /** Lambda / IMC closed-loop time constant λ in s (default τ). */
    lambda: seconds.optional(),
  })
  .strict();
export type TuneOptions = z.infer<typeof tuneOptionsSchema>;

/** The body of POST /api/v1/calc/tune. */
export const tuneRequestSchema = z.object({
  model: tuningModelSchema,
  rule: ruleIdSchema,
  controller: controllerKindSchema,
  options: tuneOptionsSchema.optional(),
});
export type TuneRequest = z.infer<typeof tuneRequestSchema>;

/** A tuned controller as the contract returns it; td is 0 for PI. Times in s. */
export const tunedControllerSchema = z.object({
  /** ideal: kc·(1 + 1/(ti·s) + td·s); series: kc·(1 + 1/(ti·s))·(1 + td·s). */
  form: z.enum(['ideal', 'series']),
  /** Controller gain, output units per measurement unit. */
  kc: z.number(),
  /** Integral time in s. */
  ti: z.number(),
  /** Derivative time in s (0 = none). */
  td: z.number(),
});
export type TunedController = z.infer<typeof tunedControllerSchema>;

export interface TuneResult {
  controller: TunedController;
  rule: RuleId;
  /** The publication the formulas come from. */
  source: string;
}
