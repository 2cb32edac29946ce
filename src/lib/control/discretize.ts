/**
 * Discrete-time equivalents of a transfer function (POST /api/v1/calc/discretize): zero-order
 * hold (exact, via the matrix exponential of the engine's state-space form) and
 * Tustin (bilinear, optionally pre-warped). The dead time becomes whole samples z^(−d).
 * Results are in descending powers of z with den[0] = 1.
 */
import { z } from 'zod';
import { TransferFunctionSchema } from '../schemas/transfer-function';
import { matrixCharacteristicPolynomial, type Matrix } from './characteristic-polynomial';
import { discretizeStates as holdEquivalent, toStateSpace } from './state-space';
import { multiply } from './polynomial';
import { parseRequest } from './request-error';
import { createTransferFunction } from './transfer-function';
import { ModelError } from './types';

export const DiscretizeRequestSchema = z.object({
  tf: TransferFunctionSchema,
  /** Sample time in s. */
  ts: z.number().positive(),
  method: z.enum(['zoh', 'tustin']),
  /** Tustin only: frequency in rad/s where the discrete response matches exactly (0 < w < π/ts). */
  prewarp: z.number().positive().optional(),
});
export type DiscretizeRequest = z.input<typeof DiscretizeRequestSchema>;

/** G(z) = num(z)/den(z)·z^(−delaySamples), descending powers of z, den[0] = 1. */
export interface DiscreteTransferFunction {
  num: number[];
  den: number[];
  delaySamples: number;
}

/** Most whole samples of dead time a discrete model may carry (a PLC's delay buffer, at most). */
export const MAX_DELAY_SAMPLES = 1_000_000;

/**
 * The dead time as whole samples, or ModelError when it is not one within 1e-9 (relative) or
 * is more than MAX_DELAY_SAMPLES samples (also when delay/ts overflows).
 */
export function delayInSamples(delay: number, ts: number): number {
  const ratio = delay / ts;
  if (!(ratio <= MAX_DELAY_SAMPLES)) {
    throw new ModelError(
      `The dead time is more than ${MAX_DELAY_SAMPLES.toLocaleString('en-US')} samples of ts; choose a longer sample time.`,
      'invalid_request',
      'tf.delay',
    );
  }
  const samples = Math.round(ratio);
  if (Math.abs(ratio - samples) > 1e-9 * Math.max(1, ratio)) {
    throw new ModelError(
      `The dead time ${delay} s is ${ratio.toPrecision(6)} samples of ${ts} s; choose a sample time that divides it.`,
      'invalid_request',
      'tf.delay',
    );
  }
  return samples;
}

/** Scales so den[0] = 1 and drops leading numerator terms that are zero. */
function normalize(num: number[], den: number[], delaySamples: number): DiscreteTransferFunction {
  const lead = den[0];
  if (![...num, ...den].every(Number.isFinite) || lead === 0) {
    throw new ModelError(
      'The discrete coefficients overflow: ts is too long for this model (or an unstable pole grows too much over one sample); shorten ts.',
      'invalid_request',
      'ts',
    );
  }
  const n = num.map((c) => c / lead);
  const peak = Math.max(...n.map(Math.abs));
  let i = 0;
  while (i < n.length - 1 && Math.abs(n[i]) <= 1e-14 * peak) i++;
  return { num: n.slice(i), den: den.map((c) => c / lead), delaySamples };
}

/**
 * Zero-order hold: with (A, B, C, D) the engine's balanced state-space form of num/den,
 * Ad = e^(A·ts) and Bd = ∫₀^ts e^(A·τ)dτ·B (state-space.ts, exact by the matrix exponential);
 * den(z) = det(zI − Ad) and num(z) = det(zI − Ad + Bd·C) + (D − 1)·den(z) (the SISO
 * state-space-to-TF identity).
 */
function zoh(num: number[], den: number[], ts: number): { num: number[]; den: number[] } {
  const n = den.length - 1;
  if (n === 0) return { num: [num[0] / den[0]], den: [1] };
  const ss = toStateSpace({ num, den, delay: 0 });
  const hold = holdEquivalent(ss, ts);
  const c = ss.c[0];
  const d = ss.d[0];
  const ad: Matrix = Array.from({ length: n }, (_, i) => Array.from(hold.phi.subarray(i * n, (i + 1) * n)));
  const bd = Array.from({ length: n }, (_, i) => hold.g0[i] + hold.g1[i]);
  const closed = ad.map((row, i) => row.map((v, j) => v - bd[i] * c[j]));
  const dz = matrixCharacteristicPolynomial(ad);
  const nz = matrixCharacteristicPolynomial(closed).map((v, i) => v + (d - 1) * dz[i]);
  return { num: nz, den: dz };
}

/** Tustin: s = k·(z − 1)/(z + 1), k = 2/ts, or w/tan(w·ts/2) when pre-warped at w. */
function tustin(num: number[], den: number[], k: number): { num: number[]; den: number[] } {
  const order = den.length - 1;
  const map = (p: number[]): number[] => {
    let out = new Array<number>(order + 1).fill(0);
    const degree = p.length - 1;
    p.forEach((coef, idx) => {
      const power = degree - idx;
      let term = [coef * k ** power];
      for (let i = 0; i < power; i++) term = multiply(term, [1, -1]);
      for (let i = 0; i < order - power; i++) term = multiply(term, [1, 1]);
      out = out.map((v, i) => v + term[i]);
    });
    return out;
  };
  return { num: map(num), den: map(den) };
}

function tustinScale(ts: number, prewarp: number | undefined): number {
  if (prewarp === undefined) return 2 / ts;
  if (prewarp * ts >= Math.PI) {
    throw new ModelError(
      `A pre-warp frequency must lie below the Nyquist frequency π/ts = ${(Math.PI / ts).toPrecision(4)} rad/s.`,
      'invalid_request',
      'prewarp',
    );
  }
  return prewarp / Math.tan((prewarp * ts) / 2);
}

/** Discretizes a transfer function; validates the request (ModelError naming the field). */
export function discretize(input: DiscretizeRequest | unknown): DiscreteTransferFunction {
  const request = parseRequest(DiscretizeRequestSchema, input, (field) =>
    field.startsWith('tf.') ? 'invalid_model' : 'invalid_request',
  );
  const { num, den } = createTransferFunction(request.tf, { field: 'tf' });
  const delaySamples = delayInSamples(request.tf.delay, request.ts);
  if (request.method === 'zoh') {
    if (request.prewarp !== undefined) {
      throw new ModelError('Pre-warping applies to the Tustin method only.', 'invalid_request', 'prewarp');
    }
    const g = zoh(num, den, request.ts);
    return normalize(g.num, g.den, delaySamples);
  }
  const g = tustin(num, den, tustinScale(request.ts, request.prewarp));
  if (g.den[0] === 0) {
    throw new ModelError('The continuous system has a pole at s = k (Tustin maps it to infinity); change ts.', 'invalid_request', 'ts');
  }
  return normalize(g.num, g.den, delaySamples);
}
