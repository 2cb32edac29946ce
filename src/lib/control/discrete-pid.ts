/**
 * The difference equation a PLC runs for a PID controller at sample time ts. The controller's
 * C(s) is mapped with s = (1 − z⁻¹)/ts (backward Euler: the integral sums e·ts at each sample,
 * the filtered derivative is stable for any filter time) or s = (2/ts)(1 − z⁻¹)/(1 + z⁻¹)
 * (Tustin). Coefficients are on e[k − j] and u[k − j], e = setpoint − measurement.
 */
import { z } from 'zod';
import { PidControllerSchema } from '../schemas/controller';
import { pidToTransferFunction } from './pid';
import { toParallel } from './pid-forms';
import { multiply, trim } from './polynomial';
import { parseRequest } from './request-error';
import { ModelError, type PidController } from './types';

export const DiscretePidOptionsSchema = z
  .object({
    /** How s is mapped to z: backward Euler (default) or Tustin. */
    method: z.enum(['backward-euler', 'tustin']).default('backward-euler'),
    /** positional: u[k] itself; velocity: the change Δu[k] added to the last output (bumpless, windup-free). */
    form: z.enum(['positional', 'velocity']).default('positional'),
  })
  .strict();
export type DiscretePidOptions = z.input<typeof DiscretePidOptionsSchema>;

export interface DiscretePid {
  /** Sample time in s. */
  ts: number;
  method: 'backward-euler' | 'tustin';
  form: 'positional' | 'velocity';
  /** b[j] multiplies e[k − j]. */
  b: number[];
  /** a[0] = 1; a[j] (j ≥ 1) multiplies −u[k − j] (positional) or −Δu[k − j] (velocity). */
  a: number[];
  /** The equation as text, e.g. "u[k] = 1.6·u[k−1] − 0.6·u[k−2] + 14.02·e[k] − …". */
  equation: string;
  /** C(z) in descending powers of z with den[0] = 1 (the positional b and a). */
  transferFunction: { num: number[]; den: number[] };
  /** The same controller as separate P, I and D terms (for clamping the integral); null when it has no parallel form. */
  terms: DiscretePidTerms | null;
}

/**
 * P[k] = kp·e[k];  I[k] = I[k−1] + i0·e[k] + i1·e[k−1];  D[k] = ad·D[k−1] + bd·(e[k] − e[k−1]);
 * u[k] = P[k] + I[k] + D[k]. Backward Euler: i0 = ki·ts, i1 = 0, ad = tf/(tf+ts), bd = kd/(tf+ts);
 * Tustin: i0 = i1 = ki·ts/2, ad = (2tf−ts)/(2tf+ts), bd = 2kd/(2tf+ts).
 */
export interface DiscretePidTerms {
  kp: number;
  i0: number;
  i1: number;
  ad: number;
  bd: number;
  equation: string;
}

function separateTerms(c: PidController, ts: number, method: DiscretePid['method']): DiscretePidTerms | null {
  const p = toParallel(c);
  if (!p) return null;
  const ki = p.ki ?? 0;
  const kd = p.kd ?? 0;
  const tf = p.tf ?? 0;
  const tustin = method === 'tustin';
  const i0 = tustin ? (ki * ts) / 2 : ki * ts;
  const i1 = tustin ? i0 : 0;
  const ad = tustin ? (2 * tf - ts) / (2 * tf + ts) : tf / (tf + ts);
  const bd = tustin ? (2 * kd) / (2 * tf + ts) : kd / (tf + ts);
  const parts = [`P[k] = ${sumText([{ coef: p.kp, name: 'e[k]' }])}`];
  if (ki !== 0) parts.push(`I[k] = I[k−1] + ${sumText([{ coef: i0, name: 'e[k]' }, { coef: i1, name: 'e[k−1]' }])}`);
  if (kd !== 0) parts.push(`D[k] = ${sumText([{ coef: ad, name: 'D[k−1]' }, { coef: bd, name: '(e[k] − e[k−1])' }])}`);
  const sum = ['P[k]', ...(ki !== 0 ? ['I[k]'] : []), ...(kd !== 0 ? ['D[k]'] : [])].join(' + ');
  parts.push(`u[k] = ${sum}`);
  return { kp: p.kp, i0, i1, ad, bd, equation: parts.join('; ') };
}

/** p(s) with s replaced, times the common factor; result ascending in q = z⁻¹, length order+1. */
function substitute(p: number[], order: number, method: DiscretePid['method'], ts: number): number[] {
  let out = new Array<number>(order + 1).fill(0);
  const degree = p.length - 1;
  p.forEach((coef, idx) => {
    const power = degree - idx;
    const c = method === 'tustin' ? 2 / ts : 1 / ts;
    let term = [coef * c ** power];
    for (let i = 0; i < power; i++) term = multiply(term, [1, -1]);
    const rest = order - power;
    for (let i = 0; i < rest; i++) term = method === 'tustin' ? multiply(term, [1, 1]) : term;
    const padded = [...term, ...new Array<number>(order + 1 - term.length).fill(0)];
    out = out.map((v, i) => v + padded[i]);
  });
  return out;
}

function trimHigh(p: number[]): number[] {
  const out = p.slice();
  while (out.length > 1 && out[out.length - 1] === 0) out.pop();
  return out;
}

/** a(q)/(1 − q) when a has that factor (integral action), else null. */
function withoutIntegrator(a: number[]): number[] | null {
  const sum = a.reduce((s, v) => s + v, 0);
  if (Math.abs(sum) > 1e-12 * a.reduce((s, v) => s + Math.abs(v), 0)) return null;
  const out: number[] = [];
  let carry = 0;
  for (let i = 0; i < a.length - 1; i++) {
    carry += a[i];
    out.push(carry);
  }
  return trimHigh(out);
}

function formatNumber(x: number): string {
  return String(Number(x.toPrecision(6)));
}

function sumText(terms: { coef: number; name: string }[]): string {
  const parts = terms.filter((t) => t.coef !== 0);
  if (parts.length === 0) return '0';
  return parts
    .map((t, i) => {
      const sign = t.coef < 0 ? (i === 0 ? '−' : ' − ') : i === 0 ? '' : ' + ';
      return `${sign}${formatNumber(Math.abs(t.coef))}·${t.name}`;
    })
    .join('');
}

function lag(name: string, j: number): string {
  return j === 0 ? `${name}[k]` : `${name}[k−${j}]`;
}

/** The discrete PID a PLC would run at sample time ts (s); validates its input with zod. */
export function discretePid(controller: unknown, ts: number, options: DiscretePidOptions = {}): DiscretePid {
  const c = parseRequest(z.object({ controller: PidControllerSchema }), { controller }).controller;
  if (!(Number.isFinite(ts) && ts > 0)) {
    throw new ModelError('The sample time ts must be a positive number of seconds.', 'invalid_request', 'ts');
  }
  const { method, form } = parseRequest(z.object({ options: DiscretePidOptionsSchema }), { options }).options;
  const g = pidToTransferFunction(c, 'controller');
  const num = trim(g.num);
  const den = trim(g.den);
  if (method === 'tustin' && num.length > den.length) {
    throw new ModelError('Tustin needs a derivative filter: give tf > 0 (or n) or use backward Euler.', 'invalid_request', 'controller.tf');
  }
  const order = Math.max(num.length, den.length) - 1;
  const bRaw = substitute(num, order, method, ts);
  const aRaw = substitute(den, order, method, ts);
  const a0 = aRaw[0];
  const positional = { b: trimHigh(bRaw.map((v) => v / a0)), a: trimHigh(aRaw.map((v) => v / a0)) };
  const length = Math.max(positional.a.length, positional.b.length);
  const pad = (p: number[]) => [...p, ...new Array<number>(length - p.length).fill(0)];
  const transferFunction = { num: pad(positional.b), den: pad(positional.a) };

  let b = positional.b;
  let a = positional.a;
  if (form === 'velocity') {
    const reduced = withoutIntegrator(a);
    if (reduced) a = reduced;
    else b = multiply(b, [1, -1]);
  }
  const out = form === 'positional' ? 'u' : 'Δu';
  const rhs = sumText([
    ...a.slice(1).map((coef, j) => ({ coef: -coef, name: lag(out, j + 1) })),
    ...b.map((coef, j) => ({ coef, name: lag('e', j) })),
  ]);
  const equation =
    form === 'positional' ? `u[k] = ${rhs}` : `Δu[k] = ${rhs}; u[k] = u[k−1] + Δu[k]`;
  return { ts, method, form, b, a, equation, transferFunction, terms: separateTerms(c, ts, method) };
}
