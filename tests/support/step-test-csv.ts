import type { ProcessModel } from '../../src/lib/control/types';
import { seededGaussian } from '../lib/control/seeded-noise';

/**
 * Step-test files generated from the closed-form step responses of the low-order models
 * (Seborg, Edgar & Mellichamp, Process Dynamics and Control, ch. 5–6):
 *   FOPDT  y = y0 + K·Δu·(1 − e^(−s/τ))
 *   SOPDT  y = y0 + K·Δu·(1 − (τ1·e^(−s/τ1) − τ2·e^(−s/τ2))/(τ1 − τ2))
 *   IPDT   y = y0 + K·Δu·s
 * with s = t − ts − θ (0 before), plus seeded Gaussian noise of standard deviation sigma.
 */
export function closedFormStep(model: ProcessModel, s: number): number {
  if (s <= 0) return 0;
  if (model.type === 'fopdt') return 1 - Math.exp(-s / model.tau);
  if (model.type === 'ipdt') return s;
  const { tau1, tau2 } = model;
  return 1 - (tau1 * Math.exp(-s / tau1) - tau2 * Math.exp(-s / tau2)) / (tau1 - tau2);
}

export interface GeneratedTest {
  model: ProcessModel;
  dt: number;
  n: number;
  /** Step instant, s. */
  stepAt: number;
  u0: number;
  u1: number;
  y0: number;
  sigma: number;
  seed: number;
}

/** The samples of a generated test. */
export function generate(g: GeneratedTest): { t: number[]; y: number[]; u: number[] } {
  const noise = seededGaussian(g.seed);
  const t = Array.from({ length: g.n }, (_, i) => i * g.dt);
  const u = t.map((ti) => (ti >= g.stepAt ? g.u1 : g.u0));
  const y = t.map((ti) => g.y0 + g.model.k * (g.u1 - g.u0) * closedFormStep(g.model, ti - g.stepAt - g.model.theta) + g.sigma * noise());
  return { t, y, u };
}

/** Writes a generated test as a plant export: header, ";" and decimal commas, or "," and points; time as seconds or timestamps. */
export function toCsv(g: GeneratedTest, style: { european?: boolean; timestamps?: boolean; tag?: string } = {}): string {
  const { t, y, u } = generate(g);
  const sep = style.european ? ';' : ',';
  const num = (x: number, digits: number) => (style.european ? x.toFixed(digits).replace('.', ',') : x.toFixed(digits));
  const start = Date.UTC(2026, 2, 14, 8, 0, 0);
  const time = (ti: number) => (style.timestamps ? new Date(start + ti * 1000).toISOString().replace('T', ' ').replace('Z', '') : num(ti, 3));
  const tag = style.tag ?? 'TIC-210';
  const lines = [`${style.timestamps ? 'Timestamp' : 'Time [s]'}${sep}${tag}.PV${sep}${tag}.OUT [%]`];
  for (let i = 0; i < t.length; i++) lines.push([time(t[i]), num(y[i], 5), num(u[i], 3)].join(sep));
  return `${lines.join('\r\n')}\r\n`;
}
