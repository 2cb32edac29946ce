/**
 * Frequency response of a product of rational blocks with dead time, evaluated from the roots
 * of each block (factored form, so high orders stay well conditioned). Phase is the contract's
 * continuous phase: Σ arg(jw − z) − Σ arg(jw − p) (each in (−180°, 180°]), + 180° for a negative
 * leading gain, − w·delay; it does not depend on the sampling of w. w in rad/s, phase in degrees.
 */
import type { Complex, TransferFunction } from './types';
import { roots } from './roots';

const DEG = 180 / Math.PI;

/** Factored form k·Π(s − z)/Π(s − p)·e^(−delay·s) of a chain of blocks. */
export interface FactoredModel {
  gain: number;
  zeros: Complex[];
  poles: Complex[];
  delay: number;
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
    zeros.push(...roots(b.num));
    poles.push(...roots(b.den));
  }
  return fromFactors(gain, zeros, poles, delay);
}

export function fromFactors(gain: number, zeros: Complex[], poles: Complex[], delay: number): FactoredModel {
  return {
    gain, zeros, poles, delay,
    zr: Float64Array.from(zeros, (z) => z.re),
    zi: Float64Array.from(zeros, (z) => z.im),
    pr: Float64Array.from(poles, (p) => p.re),
    pi: Float64Array.from(poles, (p) => p.im),
  };
}

/** |G(jw)|. */
export function magnitudeAt(m: FactoredModel, w: number): number {
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
  let ph = m.gain < 0 ? Math.PI : 0;
  for (let i = 0; i < m.zr.length; i++) ph += Math.atan2(w - m.zi[i], -m.zr[i]);
  for (let i = 0; i < m.pr.length; i++) ph -= Math.atan2(w - m.pi[i], -m.pr[i]);
  return (ph - w * m.delay) * DEG;
}

/** G(jw) as a complex number. */
export function valueAt(m: FactoredModel, w: number): Complex {
  const mag = magnitudeAt(m, w);
  const ph = phaseAt(m, w) / DEG;
  return { re: mag * Math.cos(ph), im: mag * Math.sin(ph) };
}

/** The contract's frequency block: w (rad/s), mag (ratio), phaseDeg. */
export interface FrequencyResponse {
  w: number[];
  mag: number[];
  phaseDeg: number[];
}

export function frequencyResponse(m: FactoredModel, w: readonly number[]): FrequencyResponse {
  return { w: [...w], mag: w.map((x) => magnitudeAt(m, x)), phaseDeg: w.map((x) => phaseAt(m, x)) };
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
    const a = Math.hypot(r.re, r.im);
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
  return Array.from({ length: n }, (_, i) => 10 ** (lo + ((hi - lo) * i) / (n - 1)));
}
