/**
 * Polynomials as coefficient arrays in descending powers of s: [a0, a1, …, an] is
 * a0·s^n + a1·s^(n−1) + … + an.
 */
import type { Complex } from './types';

/** Drops leading zero coefficients; an all-zero polynomial becomes [0]. */
export function trim(p: readonly number[]): number[] {
  let i = 0;
  while (i < p.length - 1 && p[i] === 0) i++;
  return p.length === 0 ? [0] : p.slice(i);
}

/** Degree after trimming; −Infinity for the zero polynomial. */
export function degree(p: readonly number[]): number {
  const t = trim(p);
  return t.length === 1 && t[0] === 0 ? -Infinity : t.length - 1;
}

/** Real value p(x) by Horner's rule. */
export function evaluate(p: readonly number[], x: number): number {
  let acc = 0;
  for (let i = 0; i < p.length; i++) acc = acc * x + p[i];
  return acc;
}

/** Complex value p(z) by Horner's rule. */
export function evaluateComplex(p: readonly number[], z: Complex): Complex {
  let re = 0;
  let im = 0;
  for (let i = 0; i < p.length; i++) {
    const r = re * z.re - im * z.im + p[i];
    im = re * z.im + im * z.re;
    re = r;
  }
  return { re, im };
}

/** Product of two polynomials. */
export function multiply(a: readonly number[], b: readonly number[]): number[] {
  const out = new Array<number>(a.length + b.length - 1).fill(0);
  for (let i = 0; i < a.length; i++) {
    for (let j = 0; j < b.length; j++) out[i + j] += a[i] * b[j];
  }
  return out;
}

/** Sum of two polynomials (aligned at the constant term). */
export function add(a: readonly number[], b: readonly number[]): number[] {
  const n = Math.max(a.length, b.length);
  const out = new Array<number>(n).fill(0);
  for (let i = 0; i < a.length; i++) out[n - a.length + i] += a[i];
  for (let i = 0; i < b.length; i++) out[n - b.length + i] += b[i];
  return trim(out);
}

/** Every coefficient times k. */
export function scale(p: readonly number[], k: number): number[] {
  return p.map((c) => c * k);
}

/** Product of many polynomials; [1] for none. */
export function product(list: readonly (readonly number[])[]): number[] {
  return list.reduce<number[]>((acc, p) => multiply(acc, p), [1]);
}

/** Monic polynomial with the given roots (conjugate pairs give real coefficients). */
export function fromRoots(roots: readonly Complex[]): number[] {
  let re = [1];
  let im = [0];
  for (const r of roots) {
    const nre = new Array<number>(re.length + 1).fill(0);
    const nim = new Array<number>(re.length + 1).fill(0);
    for (let i = 0; i < re.length; i++) {
      nre[i] += re[i];
      nim[i] += im[i];
      nre[i + 1] -= re[i] * r.re - im[i] * r.im;
      nim[i + 1] -= re[i] * r.im + im[i] * r.re;
    }
    re = nre;
    im = nim;
  }
  return re;
}

/** Number of trailing zero coefficients, i.e. the multiplicity of the root at s = 0. */
export function zeroRootCount(p: readonly number[]): number {
  const t = trim(p);
  let k = 0;
  while (k < t.length - 1 && t[t.length - 1 - k] === 0) k++;
  return k;
}

/** k-th derivative of a polynomial in descending powers (k = 1 by default). */
export function derivative(c: readonly number[], k = 1): number[] {
  let p = [...c];
  for (let j = 0; j < k; j++) {
    const n = p.length - 1;
    p = p.slice(0, -1).map((v, i) => v * (n - i));
  }
  return p;
}
