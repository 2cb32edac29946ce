import { z } from 'zod';

/** A finite number (the URL and MDX props can carry anything). */
const Finite = z.number();
/** A time constant in s, > 0. */
const TimeConstant = z.number().positive('A time constant must be above 0 s.');
/** An optional name shown on the block, e.g. "Steam valve" or "RTD TT-210". */
const Label = z.string().trim().max(40, 'Keep a block label under 40 characters.').optional();

/** k: a pure gain (a valve's %/% gain, a transmitter's span ratio). */
export const GainBlockSchema = z.object({
  kind: z.literal('gain'),
  label: Label,
  /** Gain, plain ratio. */
  k: Finite,
});

/** k/(τs + 1). */
export const FirstOrderBlockSchema = z.object({
  kind: z.literal('first-order'),
  label: Label,
  /** Steady-state gain, plain ratio. */
  k: Finite,
  /** Time constant τ, s. */
  tau: TimeConstant,
});

/** k·ωn²/(s² + 2ζωn·s + ωn²). */
export const SecondOrderBlockSchema = z.object({
  kind: z.literal('second-order'),
  label: Label,
  /** Steady-state gain, plain ratio. */
  k: Finite,
  /** Natural frequency ωn, rad/s, > 0. */
  wn: z.number().positive('The natural frequency must be above 0 rad/s.'),
  /** Damping ratio ζ, ≥ 0 (below 1 oscillates). */
  zeta: z.number().min(0, 'The damping ratio cannot be negative.'),
});

/** e^(−θs): transport delay (a pipe run, a conveyor, an analyser's sample line). */
export const DeadTimeBlockSchema = z.object({
  kind: z.literal('dead-time'),
  label: Label,
  /** Dead time θ, s, ≥ 0. */
  theta: z.number().min(0, 'Dead time cannot be negative.'),
});

/** k/s: an integrating process (a tank level), k the slope gain in 1/s. */
export const IntegratorBlockSchema = z.object({
  kind: z.literal('integrator'),
  label: Label,
  /** Slope gain, 1/s (rate of change of the output per unit input). */
  k: Finite,
});

/** k·(T_lead·s + 1)/(T_lag·s + 1). */
export const LeadLagBlockSchema = z.object({
  kind: z.literal('lead-lag'),
  label: Label,
  /** Steady-state gain, plain ratio. */
  k: Finite,
  /** Lead time, s, ≥ 0 (a negative lead would be a right-half-plane zero: use a custom block). */
  tLead: z.number().min(0, 'The lead time cannot be negative.'),
  /** Lag time, s, > 0. */
  tLag: TimeConstant,
});

/** Any proper rational block num(s)/den(s), coefficients highest power first. */
export const CustomBlockSchema = z.object({
  kind: z.literal('custom'),
  label: Label,
  /** Numerator coefficients, highest power of s first. */
  num: z.array(Finite).min(1, 'Give at least one numerator coefficient.').max(21, 'Keep the order at 20 or less.'),
  /** Denominator coefficients, highest power of s first; not all zero. */
  den: z
    .array(Finite)
    .min(1, 'Give at least one denominator coefficient.')
    .max(21, 'Keep the order at 20 or less.')
    .refine((d) => d.some((c) => c !== 0), 'The denominator cannot be all zeros.'),
});

/** One block of a chain (actuator → process → sensor), the block-chain calculator's unit. */
export const BlockSchema = z.discriminatedUnion('kind', [
  GainBlockSchema,
  FirstOrderBlockSchema,
  SecondOrderBlockSchema,
  DeadTimeBlockSchema,
  IntegratorBlockSchema,
  LeadLagBlockSchema,
  CustomBlockSchema,
]);

export type Block = z.infer<typeof BlockSchema>;
export type BlockKind = Block['kind'];
export const BLOCK_KINDS = BlockSchema.options.map((o) => o.shape.kind.value) as BlockKind[];
