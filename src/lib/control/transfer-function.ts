/**
 * Transfer functions G(s) = num(s)/den(s)·e^(−delay·s): construction and validation.
 * Validation failures are ModelErrors whose field is a dotted path (prefix + "den.0").
 */
import { ModelError, type TransferFunction } from './types';
import { degree, trim } from './polynomial';

/** Highest order the engine accepts for one transfer function (contract: 20). */
export const MAX_ORDER = 20;

/** What a caller may hand in: the contract's `{ num, den, delay? }`. */
export interface TransferFunctionInput {
  num: readonly number[];
  den: readonly number[];
  delay?: number;
}

export interface CreateOptions {
  /** Dotted path of this transfer function in the request, e.g. "plant.1" ("" for the root). */
  field?: string;
  /** Accept deg num > deg den (an unfiltered derivative); default false. */
  allowImproper?: boolean;
}

function join(prefix: string, key: string | number): string {
  return prefix ? `${prefix}.${key}` : String(key);
}

function checkCoefficients(list: unknown, path: string, what: string): number[] {
  if (!Array.isArray(list) || list.length === 0) {
    throw new ModelError(`The ${what} needs at least one coefficient (a list of numbers, highest power of s first).`, 'invalid_model', path);
  }
  list.forEach((c, i) => {
    if (typeof c !== 'number' || !Number.isFinite(c)) {
      throw new ModelError(`Coefficient ${i} of the ${what} must be a finite number.`, 'invalid_model', join(path, i));
    }
  });
  return list as number[];
}

/** Validated, trimmed transfer function; throws ModelError naming the offending field. */
export function createTransferFunction(input: TransferFunctionInput, options: CreateOptions = {}): TransferFunction {
  const prefix = options.field ?? '';
  if (typeof input !== 'object' || input === null) {
    throw new ModelError('A transfer function is an object { num, den, delay }.', 'invalid_model', prefix || undefined);
  }
  const num = trim(checkCoefficients(input.num, join(prefix, 'num'), 'numerator'));
  const den = trim(checkCoefficients(input.den, join(prefix, 'den'), 'denominator'));
  if (degree(den) === -Infinity) {
    throw new ModelError('The denominator is all zeros; give at least one non-zero coefficient.', 'invalid_model', join(prefix, 'den'));
  }
  if (degree(den) > MAX_ORDER) {
    throw new ModelError(`The denominator has order ${degree(den)}; at most ${MAX_ORDER} is supported.`, 'invalid_model', join(prefix, 'den'));
  }
  if (degree(num) > MAX_ORDER) {
    throw new ModelError(`The numerator has order ${degree(num)}; at most ${MAX_ORDER} is supported.`, 'invalid_model', join(prefix, 'num'));
  }
  if (!options.allowImproper && degree(num) > degree(den)) {
    throw new ModelError('The numerator has a higher order than the denominator (improper); add poles or a filter.', 'invalid_model', join(prefix, 'num'));
  }
  const delay = input.delay ?? 0;
  if (typeof delay !== 'number' || !Number.isFinite(delay) || delay < 0) {
    throw new ModelError('The dead time must be a finite number of seconds, zero or more.', 'invalid_model', join(prefix, 'delay'));
  }
  return { num, den, delay };
}

/** Shorthand without validation for code that builds known-good models. */
export function tf(num: number[], den: number[], delay = 0): TransferFunction {
  return { num: trim(num), den: trim(den), delay };
}

/** Whether deg num ≤ deg den. */
export function isProper(g: TransferFunction): boolean {
  return degree(g.num) <= degree(g.den);
}

/** Relative degree deg den − deg num (negative for improper; Infinity for G = 0). */
export function relativeDegree(g: TransferFunction): number {
  return degree(g.den) - degree(g.num);
}

/** Static gain G(0): Infinity-free; null when G has a pole at s = 0. */
export function dcGain(g: TransferFunction): number | null {
  const d = g.den[g.den.length - 1];
  const n = g.num[g.num.length - 1];
  if (d === 0) return n === 0 ? dcGainCancelled(g) : null;
  return n / d;
}

/** G(0) when num and den share roots at s = 0 (cancel them one by one). */
function dcGainCancelled(g: TransferFunction): number | null {
  let num = g.num.slice();
  let den = g.den.slice();
  while (num.length > 1 && den.length > 1 && num[num.length - 1] === 0 && den[den.length - 1] === 0) {
    num = num.slice(0, -1);
    den = den.slice(0, -1);
  }
  const d = den[den.length - 1];
  return d === 0 ? null : num[num.length - 1] / d;
}
