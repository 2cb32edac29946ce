/**
 * A discrete transfer function G(z) = num(z)/den(z)·z^(−d) (descending powers of z, den[0] = 1)
 * as the recurrence a PLC or a spreadsheet runs, and that recurrence run for a unit step.
 */

/** G(z) in the contract's discretize answer. */
export interface DiscreteTf {
  num: readonly number[];
  den: readonly number[];
  delaySamples: number;
}

/** Coefficients of the recurrence y[k] = Σ b[j]·u[k−j] − Σ a[j]·y[k−j] (a[0] = 1 left out). */
export interface Recurrence {
  /** b[j] multiplies u[k − j]. */
  b: number[];
  /** a[j] (j ≥ 1) multiplies −y[k − j]; a[0] = 1. */
  a: number[];
}

/** Lines up num and den in powers of z^(−1), delay samples included. */
export function recurrence(g: DiscreteTf): Recurrence {
  const n = g.den.length - 1;
  const a0 = g.den[0] ?? 1;
  const a = g.den.map((c) => c / a0);
  // num has degree ≤ n: its z^m coefficient sits at lag n − m, then shift by the delay.
  const lead = n - (g.num.length - 1);
  const b = new Array<number>(lead + g.delaySamples).fill(0).concat(g.num.map((c) => c / a0));
  while (b.length > 1 && b[b.length - 1] === 0) b.pop();
  return { b, a };
}

function term(coef: number, name: string, lag: number, first: boolean): string {
  const index = lag === 0 ? `${name}[k]` : `${name}[k−${lag}]`;
  const value = String(Number(Math.abs(coef).toPrecision(6)));
  const sign = coef < 0 ? (first ? '−' : ' − ') : first ? '' : ' + ';
  return `${sign}${value}·${index}`;
}

/** The recurrence as one line, e.g. "y[k] = 0.9048·y[k−1] + 0.1903·u[k−3]". */
export function differenceEquationText(g: DiscreteTf, output = 'y', input = 'u'): string {
  const { a, b } = recurrence(g);
  const terms: string[] = [];
  a.slice(1).forEach((c, i) => c !== 0 && terms.push(term(-c, output, i + 1, terms.length === 0)));
  b.forEach((c, j) => c !== 0 && terms.push(term(c, input, j, terms.length === 0)));
  return `${output}[k] = ${terms.length ? terms.join('') : '0'}`;
}

/** y[0..steps−1] for a unit step u[k] = 1 (k ≥ 0), starting from rest. */
export function discreteStep(g: DiscreteTf, steps: number): number[] {
  const { a, b } = recurrence(g);
  const y: number[] = [];
  for (let k = 0; k < steps; k++) {
    let v = 0;
    for (let j = 0; j < b.length; j++) if (k - j >= 0) v += b[j]!;
    for (let j = 1; j < a.length; j++) if (k - j >= 0) v -= a[j]! * y[k - j]!;
    y.push(v);
  }
  return y;
}
