/**
 * Parsing a typed transfer function such as `2.5*exp(-4s)/((30s+1)(5s+1))` into
 * { num, den, delay }. mathjs's parser reads the text (implicit multiplication like `30s` and
 * `(…)(…)` included); the algebra on the tree is done here on polynomials, so nothing is
 * evaluated and only `s`, numbers, + − * / ^, `exp(−θ·s)` (or `e^(−θ·s)`), `pi` and `e` are
 * accepted. This module pulls in mathjs's parser (a separate entry: import it from
 * `src/lib/control/parse`, not from the engine's index).
 */
import { create, parseDependencies, type MathNode } from 'mathjs';
import { ModelError, type TransferFunction } from './types';

const math = create({ parseDependencies });

/** value = num(s)/den(s)·e^(−delay·s), descending powers of s. */
interface Term {
  num: number[];
  den: number[];
  delay: number;
}

export interface ParseOptions {
  /** Dotted path of the expression in the request, for errors (default "expression"). */
  field?: string;
  /** Accept more zeros than poles (e.g. an unfiltered PD); default false. */
  allowImproper?: boolean;
}

const MAX_LENGTH = 500;
const MAX_ORDER = 20;

function trim(p: number[]): number[] {
  let i = 0;
  while (i < p.length - 1 && p[i] === 0) i++;
  return p.slice(i);
}
function mul(a: number[], b: number[]): number[] {
  const out = new Array<number>(a.length + b.length - 1).fill(0);
  for (let i = 0; i < a.length; i++) for (let j = 0; j < b.length; j++) out[i + j] += a[i] * b[j];
  return out;
}
function add(a: number[], b: number[]): number[] {
  const n = Math.max(a.length, b.length);
  const out = new Array<number>(n).fill(0);
  a.forEach((c, i) => (out[n - a.length + i] += c));
  b.forEach((c, i) => (out[n - b.length + i] += c));
  return trim(out);
}
const isZero = (p: number[]) => p.every((c) => c === 0);
const constant = (c: number): Term => ({ num: [c], den: [1], delay: 0 });

class Reader {
  constructor(private readonly field: string) {}

  fail(message: string): never {
    throw new ModelError(message, 'invalid_request', this.field);
  }

  /** The plain number a term stands for, or null when it depends on s. */
  asConstant(t: Term): number | null {
    const num = trim(t.num);
    const den = trim(t.den);
    return num.length === 1 && den.length === 1 && t.delay === 0 ? num[0] / den[0] : null;
  }

  exp(arg: Term): Term {
    const num = trim(arg.num);
    const den = trim(arg.den);
    if (arg.delay !== 0 || den.length !== 1 || num.length > 2) {
      this.fail('exp() takes a dead time in the form exp(-θ·s), e.g. exp(-4s).');
    }
    const slope = num.length === 2 ? num[0] / den[0] : 0;
    const offset = num[num.length - 1] / den[0];
    if (slope > 0) this.fail('exp(+θ·s) would be a prediction; a dead time is written exp(-θ·s) with θ ≥ 0.');
    return { num: [Math.exp(offset)], den: [1], delay: -slope };
  }

  power(base: Term, exponent: Term): Term {
    const p = this.asConstant(exponent);
    if (p === null) return this.fail('An exponent must be a number (s^2, (5s+1)^3).');
    if (!Number.isInteger(p) || Math.abs(p) > MAX_ORDER) this.fail(`Exponents must be whole numbers up to ${MAX_ORDER}; got ${p}.`);
    let num = [1];
    let den = [1];
    for (let i = 0; i < Math.abs(p); i++) {
      num = mul(num, base.num);
      den = mul(den, base.den);
    }
    return p >= 0 ? { num, den, delay: base.delay * p } : this.divide(constant(1), { num, den, delay: base.delay * -p });
  }

  divide(a: Term, b: Term): Term {
    if (isZero(b.num)) this.fail('The expression divides by zero.');
    return { num: mul(a.num, b.den), den: mul(a.den, b.num), delay: a.delay - b.delay };
  }

  sum(a: Term, b: Term, sign: 1 | -1): Term {
    const bothDelayed = !isZero(a.num) && !isZero(b.num);
    if (bothDelayed && Math.abs(a.delay - b.delay) > 1e-12 * Math.max(a.delay, b.delay)) {
      this.fail('Terms with different dead times cannot be added into one transfer function with one delay.');
    }
    const delay = isZero(a.num) ? b.delay : a.delay;
    return {
      num: add(mul(a.num, b.den), mul(b.num, a.den).map((c) => sign * c)),
      den: mul(a.den, b.den),
      delay,
    };
  }

  read(node: MathNode): Term {
    switch (node.type) {
      case 'ConstantNode': {
        const value = (node as unknown as { value: unknown }).value;
        if (typeof value !== 'number' || !Number.isFinite(value)) this.fail(`${String(value)} is not a finite number.`);
        return constant(value);
      }
      case 'SymbolNode': {
        const name = (node as unknown as { name: string }).name;
        if (name === 's') return { num: [1, 0], den: [1], delay: 0 };
        if (name === 'pi') return constant(Math.PI);
        if (name === 'e') return constant(Math.E);
        return this.fail(`Unknown name "${name}": write the model in s, e.g. 2.5*exp(-4s)/((30s+1)(5s+1)).`);
      }
      case 'ParenthesisNode':
        return this.read((node as unknown as { content: MathNode }).content);
      case 'FunctionNode': {
        const f = node as unknown as { fn: { name?: string }; args: MathNode[] };
        if (f.fn.name !== 'exp' || f.args.length !== 1) {
          this.fail(`Only exp(-θ·s) may be called; "${f.fn.name ?? 'this'}(…)" is not supported.`);
        }
        return this.exp(this.read(f.args[0]));
      }
      case 'OperatorNode':
        return this.operator(node as unknown as { fn: string; args: MathNode[]; implicit: boolean });
      default:
        return this.fail(`"${node.toString()}" is not part of a transfer function.`);
    }
  }

  operator(node: { fn: string; args: MathNode[]; implicit: boolean }): Term {
    const [left, right] = node.args;
    switch (node.fn) {
      case 'unaryMinus': {
        const t = this.read(left);
        return { ...t, num: t.num.map((c) => -c) };
      }
      case 'unaryPlus':
        return this.read(left);
      case 'add':
        return this.sum(this.read(left), this.read(right), 1);
      case 'subtract':
        return this.sum(this.read(left), this.read(right), -1);
      case 'multiply': {
        if (node.implicit && left.type === 'OperatorNode' && (left as unknown as { fn: string }).fn === 'divide') {
          this.fail(`"${left.toString()} ${right.toString()}" is ambiguous: write ${(left as unknown as { args: MathNode[] }).args[0].toString()}/(… ${right.toString()}) or put the fraction in parentheses.`);
        }
        const a = this.read(left);
        const b = this.read(right);
        return { num: mul(a.num, b.num), den: mul(a.den, b.den), delay: a.delay + b.delay };
      }
      case 'divide':
        return this.divide(this.read(left), this.read(right));
      case 'pow': {
        const base = this.read(left);
        const exponent = this.read(right);
        if (this.asConstant(base) === Math.E && this.asConstant(exponent) === null) return this.exp(exponent);
        return this.power(base, exponent);
      }
      default:
        return this.fail(`The operator "${node.fn}" is not allowed in a transfer function.`);
    }
  }
}

/** Parses a typed transfer function; ModelError('invalid_request') with the reason otherwise. */
export function parseTransferFunction(expression: string, options: ParseOptions = {}): TransferFunction {
  const field = options.field ?? 'expression';
  const reader = new Reader(field);
  if (typeof expression !== 'string' || expression.trim() === '') reader.fail('Type a transfer function, e.g. 0.8*exp(-2s)/(12s+1).');
  if (expression.length > MAX_LENGTH) reader.fail(`The expression is longer than ${MAX_LENGTH} characters.`);
  let tree: MathNode;
  try {
    tree = math.parse(expression);
  } catch (error) {
    return reader.fail(`The expression does not parse: ${(error as Error).message}.`);
  }
  const term = reader.read(tree);
  const num = trim(term.num);
  const den = trim(term.den);
  if (isZero(num)) reader.fail('The expression is identically zero.');
  if (isZero(den)) reader.fail('The denominator is zero.');
  if (![...num, ...den, term.delay].every(Number.isFinite)) reader.fail('The expression gives numbers too large to represent.');
  if (den.length - 1 > MAX_ORDER || num.length - 1 > MAX_ORDER) reader.fail(`The order is above ${MAX_ORDER}.`);
  if (!options.allowImproper && num.length > den.length) {
    reader.fail('The numerator has a higher order than the denominator (improper); add poles or a filter.');
  }
  if (term.delay < -1e-12) reader.fail('The expression has a negative dead time (a prediction e^(+θs)).');
  const lead = den[0];
  // Keep the user's scaling unless the denominator came out negative-led.
  const sign = lead < 0 ? -1 : 1;
  return { num: num.map((c) => c * sign), den: den.map((c) => c * sign), delay: Math.max(0, term.delay) };
}
