import { z } from 'zod';
import { TransferFunctionSchema } from '../../schemas';
import { magnitudeMessage, reasonableMagnitude } from './magnitude';

/** The contract's limit on the order of each transfer function given. */
export const MAX_ORDER = 20;

/** Custom issues name their contract code in `params.code`. */
const MODEL = { code: 'invalid_model' };

/** Degree of a coefficient list (descending powers) once leading zeros are dropped; null if all zero. */
export function degreeOf(coefficients: readonly number[]): number | null {
  const first = coefficients.findIndex((c) => c !== 0);
  return first < 0 ? null : coefficients.length - 1 - first;
}

/**
 * A process or sensor transfer function as the calculation routes accept it: the shared shape,
 * no unknown keys, and the model checks of the contract (a denominator that is not all zero,
 * a non-zero numerator, proper, order at most 20). Issues carry their path (`den`, `num`).
 */
export const ProperTransferFunctionSchema = TransferFunctionSchema.strict()
  .superRefine((tf, ctx) => {
    for (const key of ['num', 'den'] as const) {
      const at = tf[key].findIndex((c) => !reasonableMagnitude(c));
      if (at >= 0) {
        ctx.addIssue({ code: 'custom', params: MODEL, path: [key, at], message: magnitudeMessage(tf[key][at]!) });
        return;
      }
    }
    if (!reasonableMagnitude(tf.delay)) {
      ctx.addIssue({ code: 'custom', params: MODEL, path: ['delay'], message: magnitudeMessage(tf.delay) });
      return;
    }
    const denDegree = degreeOf(tf.den);
    const numDegree = degreeOf(tf.num);
    if (denDegree === null) {
      ctx.addIssue({ code: 'custom', params: MODEL, path: ['den'], message: 'The denominator is all zeros; give at least one non-zero coefficient.' });
      return;
    }
    if (numDegree === null) {
      ctx.addIssue({ code: 'custom', params: MODEL, path: ['num'], message: 'The numerator is all zeros, so the model has no effect; give a non-zero gain.' });
      return;
    }
    if (denDegree > MAX_ORDER) {
      ctx.addIssue({ code: 'custom', params: MODEL, path: ['den'], message: `The denominator has order ${denDegree}; the limit is ${MAX_ORDER}, so reduce the model.` });
      return;
    }
    if (numDegree > denDegree) {
      ctx.addIssue({
        code: 'custom',
        params: MODEL,
        path: ['num'],
        message: `The model is improper (numerator order ${numDegree} above denominator order ${denDegree}); add poles or remove zeros.`,
      });
    }
  })
  .meta({
    id: 'TransferFunction',
    description: 'G(s) = num(s)/den(s)·e^(−delay·s); coefficients in descending powers of s, delay in s.',
    example: { num: [1], den: [10, 1], delay: 2 },
  });

export type ProperTransferFunction = z.output<typeof ProperTransferFunctionSchema>;
