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
  /** The blocks' non-constant polynomials, numerators then denominators (Horner evaluation). */
  horner: HornerForm;
}

/**
 * The blocks prepared for Horner's rule: constants folded into one factor, the other
 * polynomials in ascending powers (for w ≤ 1) and as given (the reversed polynomial in 1/(jw),
 * for w > 1), and the net degree Σ deg num − Σ deg den.
 */
interface HornerForm {
  constant: number;
  ascending: Float64Array[];
  descending: Float64Array[];
  /** How many of the lists' polynomials are numerators (they come first). */
  numerators: number;
  netDegree: number;
}

function hornerForm(blocks: readonly { num: number[]; den: number[] }[]): HornerForm {
  let constant = 1, netDegree = 0;
  const nums: number[][] = [], dens: number[][] = [];
  for (const b of blocks) {
    if (b.num.length === 1) constant *= b.num[0]; else nums.push(b.num);
    if (b.den.length === 1) constant /= b.den[0]; else dens.push(b.den);
    netDegree += b.num.length - b.den.length;
  }
  const all = [...nums, ...dens];
  return {
    constant,
    ascending: all.map((p) => Float64Array.from(p).reverse()),
    descending: all.map((p) => Float64Array.from(p)),
    numerators: nums.length,
    netDegree,
  };
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
    checkRootSpan(z, p);
    zeros.push(...z);
    poles.push(...p);
  }
  const finite = (r: Complex) => Number.isFinite(r.re) && Number.isFinite(r.im);
  if (!zeros.every(finite) || !poles.every(finite) || !Number.isFinite(gain)) {
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
function checkRootSpan(zeros: readonly Complex[], poles: readonly Complex[]): void {
  let lo = Infinity, hi = 0;
  for (const list of [zeros, poles]) {
    for (const r of list) {
      const a = cabs(r.re, r.im);
      if (a === 0) continue;
      lo = Math.min(lo, a);
      hi = Math.max(hi, a);
    }
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
    zr: parts(zeros, 're'),
    zi: parts(zeros, 'im'),
    pr: parts(poles, 're'),
    pi: parts(poles, 'im'),
    horner: hornerForm(blocks),
  };
}

/** One part of every root, as a flat array for the inner loops. */
function parts(list: readonly Complex[], key: 're' | 'im'): Float64Array {
  const out = new Float64Array(list.length);
  for (let i = 0; i < list.length; i++) out[i] = list[i][key];
  return out;
}

const hornerOut = { mag: 0, arg: 0 };

/** w^k for an integer k: repeated products for the usual small k (Math.pow costs far more). */
function integerPower(w: number, k: number): number {
  if (k === 0) return 1;
  if (k > 8 || k < -8) return Math.pow(w, k);
  let v = w;
  for (let i = 1; i < Math.abs(k); i++) v *= w;
  return k > 0 ? v : 1 / v;
}

/** Running products beyond these bounds are rescaled, so long chains neither overflow nor underflow. */
const RESCALE_HIGH = 1e100, RESCALE_LOW = 1e-100;

/**
 * |G(jw)| and the Horner phase (rad, within a multiple of 2π), polynomial by polynomial (into a
 * scratch object). Below w = 1 each polynomial is evaluated in jw; above, as (jw)^n·q(1/(jw))
 * with q the reversed polynomial, and the powers of jw are put back once at the end.
 */
function hornerAt(m: FactoredModel, w: number): { mag: number; arg: number } {
  const f = m.horner;
  const big = w > 1;
  const x = big ? -1 / w : w;
  const list = big ? f.descending : f.ascending;
  let nre = 1, nim = 0, dre = 1, dim = 0, logScale = 0;
  for (let k = 0; k < list.length; k++) {
    const p = list[k];
    // Σ p[i]·(jx)^i: lags and second-order factors in closed form, longer ones by Horner,
    // (re + j·im)·jx + c = (c − im·x) + j·re·x.
    let re: number, im: number;
    if (p.length === 2) {
      re = p[0];
      im = p[1] * x;
    } else if (p.length === 3) {
      re = p[0] - p[2] * x * x;
      im = p[1] * x;
    } else {
      re = 0;
      im = 0;
      for (let i = p.length - 1; i >= 0; i--) {
        const r = p[i] - im * x;
        im = re * x;
        re = r;
      }
    }
    if (k < f.numerators) {
      const r = nre * re - nim * im;
      nim = nre * im + nim * re;
      nre = r;
      const a = Math.abs(nre) + Math.abs(nim);
      if (a > RESCALE_HIGH || (a < RESCALE_LOW && a > 0)) { nre /= a; nim /= a; logScale += Math.log(a); }
    } else {
      const r = dre * re - dim * im;
      dim = dre * im + dim * re;
      dre = r;
      const a = Math.abs(dre) + Math.abs(dim);
      if (a > RESCALE_HIGH || (a < RESCALE_LOW && a > 0)) { dre /= a; dim /= a; logScale -= Math.log(a); }
    }
  }
  const d = dre * dre + dim * dim;
  const re = (nre * dre + nim * dim) / d;
  const im = (nim * dre - nre * dim) / d;
  const turns = big ? f.netDegree : 0;
  hornerOut.mag = Math.sqrt(re * re + im * im) * Math.abs(f.constant) * integerPower(w, turns) * (logScale !== 0 ? Math.exp(logScale) : 1);
  hornerOut.arg = Math.atan2(im, re) + (f.constant < 0 ? Math.PI : 0) + (turns * Math.PI) / 2;
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
  let ph = m.gain < 0 ? Math.PI : 0;
  if (exact) {
    for (let i = 0; i < m.zr.length; i++) ph += Math.atan2(w - m.zi[i], -m.zr[i]);
    for (let i = 0; i < m.pr.length; i++) ph -= Math.atan2(w - m.pi[i], -m.pr[i]);
  } else {
    for (let i = 0; i < m.zr.length; i++) ph += roughAtan2(w - m.zi[i], -m.zr[i]);
    for (let i = 0; i < m.pr.length; i++) ph -= roughAtan2(w - m.pi[i], -m.pr[i]);
  }
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
  return pointInto(m, w, phaseScratch).phaseDeg;
}

const phaseScratch = { mag: 0, phaseDeg: 0 };

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
  // e^(x·ln 10) rather than 10^x: Math.pow costs several times more in V8.
  for (let i = 0; i < n; i++) w[i] = Math.exp(Math.LN10 * (lo + ((hi - lo) * i) / (n - 1)));
  return w;
}
