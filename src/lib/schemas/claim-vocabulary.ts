/** The words a performance claim is written in (kept free of zod so the editor's island can list them). */
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

/** The direction of a claim's bound. */
export const CLAIM_OPS = ['<=', '>='] as const;

/** Which step a time-response claim is about. */
export const CLAIM_INPUTS = ['setpoint', 'load'] as const;
