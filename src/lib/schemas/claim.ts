import { z } from 'zod';

/** What a recipe may promise about its loop; units as in the contract (s, %, degrees, ratio). */
export const CLAIM_METRICS = [
  'overshootPct', // % of the final value, setpoint or load step
  'riseTime', // s, 10–90 %
  'settlingTime', // s, 2 % band, from t = 0
  'peak', // largest |y| — for a load step, the worst deviation per unit load
  'iae', // integral of |error| over the step, for a unit step
  'phaseMarginDeg', // degrees
  'gainMargin', // ratio
  'delayMargin', // s
  'ms', // peak sensitivity
  'mt', // complementary peak
] as const;

/** One performance claim of a recipe, e.g. overshoot ≤ 5 % on a setpoint step. */
export const ClaimSchema = z.object({
  /** The figure the claim is about. */
  metric: z.enum(CLAIM_METRICS),
  /** The direction of the bound. */
  op: z.enum(['<=', '>=']),
  /** The bound, in the metric's unit. */
  value: z.number(),
  /** For time-response metrics: which step (default setpoint). */
  input: z.enum(['setpoint', 'load']).default('setpoint'),
});

export type Claim = z.infer<typeof ClaimSchema>;
