import type { ProcessModelInput, TransferFunctionInput } from '../schemas';

/** A coefficient for a formula: up to four significant figures, no trailing zeros. */
function num(x: number): string {
  return Number(x.toPrecision(4)).toString();
}

/** A polynomial in s, highest power first, as LaTeX ("2.5 s + 1"). */
export function polynomialLatex(coefficients: number[]): string {
  const n = coefficients.length - 1;
  const terms: string[] = [];
  coefficients.forEach((c, i) => {
    if (c === 0) return;
    const power = n - i;
    const magnitude = Math.abs(c);
    const coef = power > 0 && magnitude === 1 ? '' : num(magnitude);
    const s = power === 0 ? '' : power === 1 ? 's' : `s^{${power}}`;
    const sign = c < 0 ? '-' : '+';
    terms.push(`${terms.length === 0 ? (c < 0 ? '-' : '') : ` ${sign} `}${coef}${coef && s ? '\\,' : ''}${s}`);
  });
  return terms.join('') || '0';
}

function delayLatex(delay: number | undefined): string {
  return delay ? `\\,e^{-${num(delay)}\\,s}` : '';
}

/** A transfer function as LaTeX: \frac{num}{den} e^{-θs}. */
export function transferFunctionLatex(tf: TransferFunctionInput): string {
  const den = polynomialLatex(tf.den);
  const body = den === '1' ? polynomialLatex(tf.num) : `\\frac{${polynomialLatex(tf.num)}}{${den}}`;
  return `${body}${delayLatex(tf.delay)}`;
}

/** A process model as LaTeX in the trade's factored form, with its numbers. */
export function modelLatex(model: ProcessModelInput): string {
  switch (model.type) {
    case 'fopdt':
      return `\\frac{${num(model.k)}}{${num(model.tau)}\\,s + 1}${delayLatex(model.theta)}`;
    case 'sopdt':
      return `\\frac{${num(model.k)}}{(${num(model.tau1)}\\,s + 1)(${num(model.tau2)}\\,s + 1)}${delayLatex(model.theta)}`;
    case 'ipdt':
      return `\\frac{${num(model.k)}}{s}${delayLatex(model.theta)}`;
    case 'tf':
      return transferFunctionLatex(model);
  }
}

/** The symbolic form of a model type, e.g. K e^{-θs}/(τs+1). */
export const MODEL_FORMS: Record<ProcessModelInput['type'], string> = {
  fopdt: '\\frac{K\\,e^{-\\theta s}}{\\tau s + 1}',
  sopdt: '\\frac{K\\,e^{-\\theta s}}{(\\tau_1 s + 1)(\\tau_2 s + 1)}',
  ipdt: '\\frac{K\\,e^{-\\theta s}}{s}',
  tf: '\\frac{N(s)}{D(s)}\\,e^{-\\theta s}',
};
