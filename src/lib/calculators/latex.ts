/**
 * Transfer functions as KaTeX source: polynomials in s with 4 significant digits, the dead time
 * as e^{−θs}. Pure string building; the island hands the result to katex.renderToString.
 */
import { formatNumber } from './units';

function coefficient(c: number, power: number): string {
  const text = formatNumber(Math.abs(c)).replace(/e([-+]?\d+)$/, (_, exp: string) => `\\times10^{${Number(exp)}}`);
  if (power === 0) return text;
  const variable = power === 1 ? 's' : `s^{${power}}`;
  return Math.abs(c) === 1 ? variable : `${text}\\,${variable}`;
}

/** A polynomial (descending powers of s) as LaTeX, e.g. [30, 1] → "30\,s + 1"; zeros skipped. */
export function polynomialLatex(coefficients: readonly number[]): string {
  const degree = coefficients.length - 1;
  const terms: string[] = [];
  coefficients.forEach((c, i) => {
    if (c === 0) return;
    const term = coefficient(c, degree - i);
    if (terms.length === 0) terms.push(c < 0 ? `-${term}` : term);
    else terms.push(c < 0 ? `- ${term}` : `+ ${term}`);
  });
  return terms.length === 0 ? '0' : terms.join(' ');
}

/** num/den·e^(−delay·s) as LaTeX; a denominator of 1 is left out. */
export function transferFunctionLatex(tf: { num: readonly number[]; den: readonly number[]; delay?: number }): string {
  const num = polynomialLatex(tf.num);
  const denIsOne = tf.den.every((c, i) => (i === tf.den.length - 1 ? c === 1 : c === 0));
  const rational = denIsOne ? num : `\\dfrac{${num}}{${polynomialLatex(tf.den)}}`;
  const delay = tf.delay ?? 0;
  if (delay <= 0) return rational;
  const exponent = `e^{-${formatNumber(delay)}\\,s}`;
  return rational === '1' ? exponent : `${rational}\\,${exponent}`;
}

/** A polynomial as plain text, e.g. [150, 35, 1] → "150 s^2 + 35 s + 1". */
export function polynomialText(coefficients: readonly number[]): string {
  return polynomialLatex(coefficients)
    .replace(/\\times10\^\{(-?\d+)\}/g, 'e$1')
    .replace(/\\,/g, ' ')
    .replace(/s\^\{(\d+)\}/g, 's^$1');
}

/** num/den·e^(−delay·s) as plain text, shown before the typeset formula is ready. */
export function transferFunctionText(tf: { num: readonly number[]; den: readonly number[]; delay?: number }): string {
  const den = polynomialText(tf.den);
  const rational = den === '1' ? polynomialText(tf.num) : `(${polynomialText(tf.num)}) / (${den})`;
  const delay = tf.delay ?? 0;
  return delay > 0 ? `${rational} · e^(−${formatNumber(delay)} s)` : rational;
}
