/**
 * Stability margins of a loop transfer function L (contract definitions, shared/api-v1.md):
 * gainCrossover is the lowest w > 0 where |L| crosses 1 and phaseMarginDeg = 180 + phase there,
 * reduced to (−180, 180]; phaseCrossover is the lowest w > 0 where the continuous phase crosses
 * −180° (mod 360) and gainMargin = 1/|L| there; delayMargin = phase margin (rad)/gainCrossover;
 * Ms = max |1/(1 + L)|, Mt = max |L/(1 + L)|, bandwidth where |T| first falls below 1/√2 of its
 * low-frequency value. Crossings are found on a dense grid and refined by bisection on the exact
 * function. With dead time the phase crosses −180° endlessly; at most maxPhaseCrossovers are listed.
 */
import type { Margins } from './types';
import { type FactoredModel, magnitudeAt, phaseAt, pointInto } from './frequency';
import { bisectLog, loopScan, maximizeLog } from './scan-grid';

const DEG = Math.PI / 180;

export interface MarginOptions {
  /** Most phase crossovers listed (lowest first); default 6. */
  maxPhaseCrossovers?: number;
}

/** Reduce an angle in degrees to (−180, 180]. */
export function reduceDeg(x: number): number {
  return x - 360 * Math.ceil((x - 180) / 360);
}

const point = { mag: 0, phaseDeg: 0 };

/** |S| = 1/|1 + L| (key 's') or |T| = |L|/|1 + L| (key 't') at w. */
function sensitivity(m: FactoredModel, w: number, key: 's' | 't'): number {
  const p = pointInto(m, w, point);
  const mag = p.mag;
  const ph = p.phaseDeg * DEG;
  const re = 1 + mag * Math.cos(ph), im = mag * Math.sin(ph);
  const d = Math.sqrt(re * re + im * im);
  return key === 's' ? 1 / d : mag / d;
}

/** L(0) from the factored form; Infinity for a pole at the origin. */
function lowFrequencyGain(m: FactoredModel): number {
  let v = m.gain;
  for (let i = 0; i < m.zr.length; i++) v *= -m.zr[i];
  for (let i = 0; i < m.pr.length; i++) {
    if (m.pr[i] === 0 && m.pi[i] === 0) return Infinity;
    v /= -m.pr[i];
  }
  return v;
}

export function margins(m: FactoredModel, options: MarginOptions = {}): Margins {
  const maxPhase = options.maxPhaseCrossovers ?? 6;
  const scan = loopScan(m);
  const w = scan.w;
  const n = w.length;
  const mags = scan.mag;
  const phase = scan.phaseDeg;
  const sens = new Float64Array(n);
  const comp = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const mag = mags[i];
    // |1 + L|² = 1 + 2|L|cos φ + |L|² (one cosine; the peaks are refined on the exact form below).
    const d = Math.sqrt(Math.max(0, 1 + mag * (2 * Math.cos(phase[i] * DEG) + mag)));
    sens[i] = 1 / d;
    comp[i] = mag / d;
  }
  const logMagAt = (x: number) => Math.log(magnitudeAt(m, x));
  const gainCrossovers: number[] = [];
  const phaseCrossovers: number[] = [];
  // j1 of one interval is j0 of the next: the branch index of the phase, −180° + 360°·j.
  let j1 = Math.floor((phase[0] + 180) / 360);
  for (let i = 0; i + 1 < n; i++) {
    if ((mags[i] < 1) !== (mags[i + 1] < 1) && mags[i] > 0 && Number.isFinite(mags[i])) {
      gainCrossovers.push(mags[i + 1] === 1 ? w[i + 1] : bisectLog(logMagAt, w[i], w[i + 1], Math.log(mags[i])));
    }
    if (phaseCrossovers.length >= maxPhase) continue;
    const j0 = j1;
    j1 = Math.floor((phase[i + 1] + 180) / 360);
    if (j0 === j1) continue;
    const [from, to] = j1 > j0 ? [j0 + 1, j1] : [j0, j1 + 1];
    const step = j1 > j0 ? 1 : -1;
    for (let j = from; step > 0 ? j <= to : j >= to; j += step) {
      const level = -180 + 360 * j;
      const f = (x: number) => phaseAt(m, x) - level;
      phaseCrossovers.push(bisectLog(f, w[i], w[i + 1], phase[i] - level));
      if (phaseCrossovers.length >= maxPhase) break;
    }
  }
  const wgc = gainCrossovers.length ? gainCrossovers[0] : null;
  const wpc = phaseCrossovers.length ? phaseCrossovers[0] : null;
  const phaseMarginDeg = wgc === null ? null : reduceDeg(180 + phaseAt(m, wgc));
  const gainMargin = wpc === null ? null : 1 / magnitudeAt(m, wpc);
  const peaks = peakSensitivities(m, w, sens, comp);
  return {
    gainMargin,
    gainMarginDb: gainMargin === null ? null : 20 * Math.log10(gainMargin),
    phaseCrossover: wpc,
    phaseMarginDeg,
    gainCrossover: wgc,
    delayMargin: phaseMarginDeg === null || wgc === null ? null : (phaseMarginDeg * DEG) / wgc,
    ms: peaks.ms,
    mt: peaks.mt,
    bandwidth: bandwidth(m, w, comp),
    gainCrossovers,
    phaseCrossovers,
  };
}

function peakSensitivities(m: FactoredModel, w: number[], sens: Float64Array, comp: Float64Array): { ms: number; mt: number } {
  let is = 0, it = 0, ms = 0, mt = 0;
  for (let i = 0; i < w.length; i++) {
    if (sens[i] > ms) { ms = sens[i]; is = i; }
    if (comp[i] > mt) { mt = comp[i]; it = i; }
  }
  const refine = (i: number, key: 's' | 't', best: number) => {
    if (i === 0 || i === w.length - 1) return best;
    return Math.max(best, maximizeLog((x) => sensitivity(m, x, key), w[i - 1], w[i + 1]).value);
  };
  ms = refine(is, 's', ms);
  mt = refine(it, 't', mt);
  // The supremum may sit at w = 0 (e.g. an open-loop unstable plant): include L(0) when finite.
  const l0 = lowFrequencyGain(m);
  if (!Number.isFinite(l0)) mt = Math.max(mt, 1);
  else if (l0 !== -1) {
    ms = Math.max(ms, 1 / Math.abs(1 + l0));
    mt = Math.max(mt, Math.abs(l0 / (1 + l0)));
  }
  // Strictly proper loops: S → 1 as w → ∞, so the supremum is at least 1.
  if (m.pr.length > m.zr.length) ms = Math.max(ms, 1);
  return { ms, mt };
}

function bandwidth(m: FactoredModel, w: number[], comp: Float64Array): number | null {
  const l0 = lowFrequencyGain(m);
  const t0 = Number.isFinite(l0) ? Math.abs(l0 / (1 + l0)) : 1;
  if (!(t0 > 0) || !Number.isFinite(t0)) return null;
  const target = t0 / Math.SQRT2;
  const f = (x: number) => sensitivity(m, x, 't') - target;
  let prev = comp[0] - target;
  if (prev < 0) return null;
  for (let i = 1; i < w.length; i++) {
    const v = comp[i] - target;
    if (v < 0) return bisectLog(f, w[i - 1], w[i], prev);
    prev = v;
  }
  return null;
}
