import { z } from 'zod';
import { BlockSchema, ClaimSchema, PidControllerSchema, ProcessModelSchema, TransferFunctionSchema } from '../schemas';
import { TUNING_RULE_IDS } from './vocabulary';

/** An ISA-5.1 loop tag such as TIC-210, FIC-101A or PIC-400. */
export const LoopTagSchema = z
  .string()
  .regex(/^[A-Z]{2,5}-\d{2,5}[A-Z]?$/, 'Write the loop tag ISA-5.1 style, e.g. TIC-210 or FIC-101A.');

/** A calendar date, YYYY-MM-DD. YAML readers may hand over a Date; it becomes the same string. */
export const IsoDateSchema = z.preprocess(
  (v) => (v instanceof Date && !Number.isNaN(v.getTime()) ? v.toISOString().slice(0, 10) : v),
  z.iso.date('Write the date as YYYY-MM-DD.'),
);

/** The engineering units a model and controller are stated in; times are always s. */
export const LoopUnitsSchema = z.object({
  /** Unit of the measured variable, e.g. "°C", "m³/h", "% level". */
  pv: z.string().min(1),
  /** Unit of the controller output / manipulated variable, e.g. "% valve", "% speed". */
  mv: z.string().min(1),
});

/** The tuning rule the controller's numbers came from, and its design choice. */
export const TuningRuleRefSchema = z.object({
  /** A published rule the engine knows, or "field" for tuning done by hand on the plant. */
  rule: z.enum(TUNING_RULE_IDS),
  /** The rule's closed-loop time constant (SIMC τc, lambda λ, IMC λ), s; absent = rule default. */
  designTime: z.number().positive().optional(),
  /** What was done to the rule's numbers afterwards, e.g. "ti rounded to 30 s". */
  note: z.string().optional(),
});

/** One feedback loop whose claims the build recomputes: the process it sees and its controller. */
export const CheckedLoopSchema = z.object({
  /** The process the controller acts on (for an outer loop: including the closed inner loop). */
  model: ProcessModelSchema,
  /** The controller's parameters in one of the contract's forms; times in s. */
  controller: PidControllerSchema,
  /** The measurement path H(s) (transmitter lag, analyser delay); absent = ideal sensor. */
  sensor: TransferFunctionSchema.optional(),
  /** Performance claims the build proves with the engine. */
  claims: z.array(ClaimSchema).default([]),
  /** Horizon of the step responses the claims are checked on, s; absent = chosen by the engine. */
  tFinal: z.number().positive().optional(),
});

/** The inner loop of a cascade, checked like the main loop. */
export const InnerLoopSchema = CheckedLoopSchema.extend({
  /** ISA-5.1 tag of the inner (secondary) loop. */
  loopTag: LoopTagSchema,
  /** What the inner loop controls, e.g. "hot-water temperature". */
  role: z.string().min(3),
  units: LoopUnitsSchema,
});

/** A person who answers for a recipe. */
export const OwnerSchema = z.object({
  name: z.string().min(2),
  email: z.email('Give the owner as an e-mail address.'),
});

/** The blocks a loop's model was built from (actuator → process → transport, and the sensor). */
export const ModelChainSchema = z.object({
  /** Blocks of the forward path in signal order; their product is the recipe's model. */
  blocks: z.array(BlockSchema).min(1, 'Give at least one block.'),
  /** The measurement block; it is the recipe's sensor. */
  sensor: BlockSchema.optional(),
});
