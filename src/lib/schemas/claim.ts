import { z } from 'zod';
import { CLAIM_INPUTS, CLAIM_METRICS, CLAIM_OPS } from './claim-vocabulary';

export { CLAIM_METRICS };

/** One performance claim of a recipe, e.g. overshoot ≤ 5 % on a setpoint step. */
export const ClaimSchema = z.object({
  /** The figure the claim is about. */
  metric: z.enum(CLAIM_METRICS, { message: `metric is one of ${CLAIM_METRICS.join(', ')}.` }),
  /** The direction of the bound. */
  op: z.enum(CLAIM_OPS, { message: 'op is <= or >=.' }),
  /** The bound, in the metric's unit. */
  value: z.number({ message: "A claim's value is a number in its metric's unit, e.g. 5 for 5 % overshoot." }),
  /** For time-response metrics: which step (default setpoint). */
  input: z.enum(CLAIM_INPUTS, { message: 'input is setpoint or load.' }).default('setpoint'),
});

export type Claim = z.infer<typeof ClaimSchema>;
