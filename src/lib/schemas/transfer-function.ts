import { z } from 'zod';

/** Polynomial coefficients in descending powers of s. */
const Coefficients = z.array(z.number()).min(1, 'Give at least one coefficient.');

/**
 * G(s) = num(s)/den(s) · e^(−delay·s), the contract's transfer function. Structural checks only;
 * the engine's validation adds the semantic ones (all-zero den, improper, order above 20).
 */
export const TransferFunctionSchema = z.object({
  /** Numerator coefficients, highest power of s first. */
  num: Coefficients,
  /** Denominator coefficients, highest power of s first. */
  den: Coefficients,
  /** Dead time in s, ≥ 0; default 0. */
  delay: z.number().min(0, 'Dead time cannot be negative.').default(0),
});

export type TransferFunctionInput = z.input<typeof TransferFunctionSchema>;
