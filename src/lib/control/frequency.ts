/**
 * Frequency response of a product of rational blocks with dead time. Phase is the contract's
 * continuous phase: Σ arg(jw − z) − Σ arg(jw − p) (each in (−180°, 180°]), + 180° for a negative
 * leading gain, − w·delay; it does not depend on the sampling of w. w in rad/s, phase in degrees.
 * Each block is evaluated on its own (never an expanded product of blocks) by Horner's rule —
 * backward stable for the coefficients as given, in 1/(jw) above w = 1 so high orders cannot
 * overflow — and the root angles pick the 360° branch of the phase, so roots of repeated poles,
 * which are only accurate to eps^(1/m), cannot spoil magnitude or phase.
 */
import { ModelError, type Complex, type TransferFunction } from './types';
import { roots } from './roots';
import { cabs } from './roots';

const DEG = 180 / Math.PI;

/** Factored form k·Π(s − z)/Π(s − p)·e^(−delay·s) of a chain of blocks. */
export interface FactoredModel {
  gain: number;
  zeros: Complex[];
  poles: Complex[];
  delay: number;
  /** The blocks' polynomials, evaluated one block at a time. */
  blocks: { num: number[]; den: number[] }[];
  /** Flat copies for the inner loops. */
  zr: Float64Array;
  zi: Float64Array;
  pr: Float64Array;
  pi: Float64Array;
}

/** Factored form of the series connection of the blocks (no cancellation of equal pairs). */
export function factor(blocks: readonly TransferFunction[]): FactoredModel {
  let gain = 1;
  let delay = 0;
  const zeros: Complex[] = [];
  const poles: Complex[] = [];
  for (const b of blocks) {
    gain *= b.num[0] / b.den[0];
    delay += b.delay;
    const z = roots(b.num), p = roots(b.den);
    checkRootSpan([...z, ...p]);
    zeros.push(...z);
    poles.push(...p);
  }
  if (![...zeros, ...poles].every((r) => Number.isFinite(r.re) && Number.isFinite(r.im)) || !Number.isFinite(gain)) {
    throw new ModelError(
      'A pole, zero or gain of the loop lies beyond the range of numbers; the coefficients span too many decades (look for values such as 1e300).',
      'invalid_request',
    );
  }
  return fromFactors(gain, zeros, poles, delay, blocks.map((b) => ({ num: b.num, den: b.den })));
}

/** Most decades between the slowest and fastest non-zero root of one block. */
const MAX_ROOT_DECADES = 100;

/**
 * A block whose time constants lie more than MAX_ROOT_DECADES apart (e.g. ti = 1e300 s beside a
 * derivative filter of 0.08 s) cannot be evaluated in double precision: its coefficients span
 * the whole range of numbers, so roots and closed-loop verdicts would be noise. Refused.
 */
function checkRootSpan(list: readonly Complex[]): void {
  let lo = Infinity, hi = 0;
  for (const r of list) {
    const a = cabs(r.re, r.im);
    if (a === 0) continue;
    lo = Math.min(lo, a);
    hi = Math.max(hi, a);
  }
  if (hi > 0 && !(hi / lo <= 10 ** MAX_ROOT_DECADES)) {
    throw new ModelError(
      `A block of the loop has time constants more than ${MAX_ROOT_DECADES} decades apart (look for values such as 1e300 s); numbers that far apart cannot be combined accurately.`,
      'invalid_request',
    );
  }
}

export function fromFactors(gain: number, zeros: Complex[], poles: Complex[], delay: number, blocks: { num: number[]; den: number[] }[] = []): FactoredModel {
  return {
    gain, zeros, poles, delay, blocks,
    zr: Float64Array.from(zeros, (z) => z.re),
    zi: Float64Array.from(zeros, (z) => z.im),
    pr: Float64Array.from(poles, (p) => p.re),
    pi: Float64Array.from(poles, (p) => p.im),
  };
}

/**
 * p(jw) = (jw)^k·(re + j·im)·e^(logScale): below w = 1 by Horner in jw (k = 0, logScale = 0);
 * above, the reversed polynomial at 1/(jw), so the caller can combine blocks without overflow.
 */
interface PolyValue { re: number; im: number; quarterTurns: number }

function polyAtJw(p: readonly number[], w: number, out: PolyValue): void {
  const n = p.length - 1;
  let re = 0, im = 0;
  if (w <= 1) {
    for (let i = 0; i <= n; i++) {
      const r = -im * w + p[i];
      im = re * w;
      re = r;
    }
    out.re = re; out.im = im; out.quarterTurns = 0;
    return;
  }
  // q(y) = Σ p[i]·y^i with y = 1/(jw) = −j/w, so p(jw) = (jw)^n·q(y).
  const y = -1 / w;
  for (let i = n; i >= 0; i--) {
    const r = -im * y + p[i];
    im = re * y;
    re = r;
  }
  out.re = re; out.im = im; out.quarterTurns = n;
}

const scratch: PolyValue = { re: 0, im: 0, quarterTurns: 0 };

const hornerOut = { mag: 0, arg: 0 };

/** |G(jw)| and the Horner phase (rad, within a multiple of 2π), block by block (into a scratch object). */
function hornerAt(m: FactoredModel, w: number): { mag: number; arg: number } {
  let logScale = 0, turns = 0, re = 1, im = 0;
  const big = w > 1;
  for (const b of m.blocks) {
    polyAtJw(b.num, w, scratch);
    let r = re * scratch.re - im * scratch.im;
    im = re * scratch.im + im * scratch.re;
    re = r;
    turns += scratch.quarterTurns;
    polyAtJw(b.den, w, scratch);
    const d = scratch.re * scratch.re + scratch.im * scratch.im;
    r = (re * scratch.re + im * scratch.im) / d;
    im = (im * scratch.re - re * scratch.im) / d;
    re = r;
    turns -= scratch.quarterTurns;
    // Keep the running product near 1 so that long chains neither overflow nor underflow.
    const a = Math.abs(re) + Math.abs(im);
    if (a > 1e100 || (a < 1e-100 && a > 0)) { re /= a; im /= a; logScale += Math.log(a); }
  }
  // Above w = 1 each polynomial was evaluated as (jw)^n·q(1/(jw)): the powers of w net out here.
  hornerOut.mag = Math.sqrt(re * re + im * im) * (big && turns !== 0 ? Math.pow(w, turns) : 1) * (logScale !== 0 ? Math.exp(logScale) : 1);
  hornerOut.arg = Math.atan2(im, re) + (turns * Math.PI) / 2;
  return hornerOut;
}

/** atan2 to within 0.004 rad — enough to choose a 360° branch (Rajan et al. 2006 polynomial). */
function roughAtan2(y: number, x: number): number {
  const ax = Math.abs(x), ay = Math.abs(y);
  if (ax === 0 && ay === 0) return 0;
  const swap = ay > ax;
  const t = swap ? ax / ay : ay / ax;
  let a = t * (Math.PI / 4 + 0.273 * (1 - t));
  if (swap) a = Math.PI / 2 - a;
  if (x < 0) a = Math.PI - a;
  return y < 0 ? -a : a;
}

/** Root-angle phase in rad (the contract's definition, before the dead time). */
function rootPhase(m: FactoredModel, w: number, exact: boolean): number {
  const at = exact ? Math.atan2 : roughAtan2;
  let ph = m.gain < 0 ? Math.PI : 0;
  for (let i = 0; i < m.zr.length; i++) ph += at(w - m.zi[i], -m.zr[i]);
  for (let i = 0; i < m.pr.length; i++) ph -= at(w - m.pi[i], -m.pr[i]);
  return ph;
}

/** |G(jw)|. */
export function magnitudeAt(m: FactoredModel, w: number): number {
  if (m.blocks.length) return hornerAt(m, w).mag;
  let m2 = m.gain * m.gain;
  const nz = m.zr.length, np = m.pr.length;
  const n = Math.max(nz, np);
  for (let i = 0; i < n; i++) {
    if (i < nz) { const a = m.zr[i], b = w - m.zi[i]; m2 *= a * a + b * b; }
    if (i < np) { const a = m.pr[i], b = w - m.pi[i]; m2 /= a * a + b * b; }
  }
  return Math.sqrt(m2);
}

/** Continuous phase in degrees (see the module comment). */
export function phaseAt(m: FactoredModel, w: number): number {
  return pointAt(m, w).phaseDeg;
}

/** Magnitude and continuous phase together (one evaluation). */
export function pointAt(m: FactoredModel, w: number): { mag: number; phaseDeg: number } {
  const p = pointInto(m, w, { mag: 0, phaseDeg: 0 });
  return p;
}

/** pointAt writing into `out` (no allocation, for inner loops). */
export function pointInto(m: FactoredModel, w: number, out: { mag: number; phaseDeg: number }): { mag: number; phaseDeg: number } {
  const branch = rootPhase(m, w, !m.blocks.length);
  if (!m.blocks.length) {
    out.mag = magnitudeAt(m, w);
    out.phaseDeg = (branch - w * m.delay) * DEG;
    return out;
  }
  const h = hornerAt(m, w);
  const turns = Math.round((branch - h.arg) / (2 * Math.PI));
  out.mag = h.mag;
  out.phaseDeg = (h.arg + 2 * Math.PI * turns - w * m.delay) * DEG;
  return out;
}

/** G(jw) as a complex number. */
export function valueAt(m: FactoredModel, w: number): Complex {
  const p = pointAt(m, w);
  const mag = p.mag;
  const ph = p.phaseDeg / DEG;
  return { re: mag * Math.cos(ph), im: mag * Math.sin(ph) };
}

/** The contract's frequency block: w (rad/s), mag (ratio), phaseDeg. */
export interface FrequencyResponse {
  w: number[];
  mag: number[];
  phaseDeg: number[];
}

export function frequencyResponse(m: FactoredModel, w: readonly number[]): FrequencyResponse {
  const mag = new Array<number>(w.length);
  const phaseDeg = new Array<number>(w.length);
  const p = { mag: 0, phaseDeg: 0 };
  for (let i = 0; i < w.length; i++) {
    pointInto(m, w[i], p);
    mag[i] = p.mag;
    phaseDeg[i] = p.phaseDeg;
  }
  return { w: [...w], mag, phaseDeg };
}

/** Bode data: magnitude also in dB. */
export function bode(m: FactoredModel, w: readonly number[] = autoGrid(m)): FrequencyResponse & { magDb: number[] } {
  const r = frequencyResponse(m, w);
  return { ...r, magDb: r.mag.map((v) => 20 * Math.log10(v)) };
}

/** Nyquist data: real and imaginary parts of G(jw). */
export function nyquist(m: FactoredModel, w: readonly number[] = autoGrid(m)): { w: number[]; re: number[]; im: number[] } {
  const v = w.map((x) => valueAt(m, x));
  return { w: [...w], re: v.map((c) => c.re), im: v.map((c) => c.im) };
}

/** The model's characteristic frequencies (rad/s): non-zero root magnitudes and 1/delay. */
export function timeScales(m: FactoredModel): number[] {
  const out: number[] = [];
  for (const r of [...m.zeros, ...m.poles]) {
    const a = cabs(r.re, r.im);
    if (a > 0) out.push(a);
  }
  if (m.delay > 0) out.push(1 / m.delay);
  return out.length ? out : [1];
}

export interface GridOptions {
  points?: number;
  /** Decades below the slowest time scale; default 2. */
  decadesBelow?: number;
  /** Decades above the fastest time scale; default 2. */
  decadesAbove?: number;
}

/** Logarithmic grid spanning the model's time scales with margins on both sides. */
export function autoGrid(m: FactoredModel, options: GridOptions = {}): number[] {
  const scales = timeScales(m);
  const lo = Math.log10(Math.min(...scales)) - (options.decadesBelow ?? 2);
  const hi = Math.log10(Math.max(...scales)) + (options.decadesAbove ?? 2);
  const n = Math.max(2, options.points ?? 200);
  const w = new Array<number>(n);
  for (let i = 0; i < n; i++) w[i] = 10 ** (lo + ((hi - lo) * i) / (n - 1));
  return w;
}
