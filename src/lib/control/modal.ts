/**
 * Modal (diagonal) realization of a proper rational p(s) whose poles are real, simple and well
 * apart: p(s) = d + Σ rᵢ/(s − λᵢ), states ξᵢ' = λᵢ·ξᵢ + u, output Σ rᵢ·ξᵢ + d·u. Each step of a
 * simulation then costs n operations instead of n², and its exact cubic-hold discretization
 * has a closed form per mode (φ-functions), so no matrix exponential is needed. Where the poles
 * are complex, repeated or close, the residues would cancel and lose digits: modalForm answers
 * null and the caller keeps the dense realization.
 */
import type { Complex, TransferFunction } from './types';
import type { CubicHold, StateSpace } from './state-space';
import { derivative, evaluate } from './polynomial';

/** Poles closer than this fraction of the larger one are treated as a cluster (no modal form). */
const MIN_SEPARATION = 0.1;
/** Largest relative mismatch between the modal and polynomial values of p at a test point. */
const CHECK_TOLERANCE = 1e-11;

/**
 * A diagonal StateSpace (a holds the poles on its diagonal, b all ones, c the residues) for p
 * with the given poles (the roots of p.den), or null when the modal form would not be accurate.
 */
export function modalForm(p: TransferFunction, poles: readonly Complex[]): StateSpace | null {
  const n = p.den.length - 1;
  if (n === 0 || poles.length !== n || poles.some((q) => q.im !== 0)) return null;
  const lambda = poles.map((q) => q.re);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      if (Math.abs(lambda[i] - lambda[j]) < MIN_SEPARATION * Math.max(Math.abs(lambda[i]), Math.abs(lambda[j]))) return null;
    }
  }
  const lead = p.den[0];
  const num = new Array<number>(n + 1 - p.num.length).fill(0).concat(p.num);
  const d = num[0] / lead;
  // Strictly proper remainder N = num − d·den, so p = d + N/den.
  const rest = num.map((c, i) => c - d * p.den[i]).slice(1);
  const slope = derivative(p.den);
  const residues = lambda.map((l) => evaluate(rest, l) / evaluate(slope, l));
  if (!residues.every(Number.isFinite) || !agrees(p, d, lambda, residues)) return null;
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) a[i * n + i] = lambda[i];
  return { n, a, b: new Float64Array(n).fill(1), c: [Float64Array.from(residues)], d: [d], diagonal: true };
}

/** The modal sum equals p at a point away from the poles (a check on cancellation among residues). */
function agrees(p: TransferFunction, d: number, lambda: readonly number[], residues: readonly number[]): boolean {
  const s0 = lambda.reduce((acc, l) => acc + Math.abs(l), 0) / lambda.length + 1e-300;
  let modal = d;
  let size = Math.abs(d);
  for (let i = 0; i < lambda.length; i++) {
    const term = residues[i] / (s0 - lambda[i]);
    modal += term;
    size += Math.abs(term);
  }
  const exact = evaluate(p.num, s0) / evaluate(p.den, s0);
  return Math.abs(modal - exact) <= CHECK_TOLERANCE * Math.max(size, Math.abs(exact));
}

/** φ₁…φ₄ at z: φₖ(z) = Σₘ zᵐ/(m + k)! (series for |z| < 2, the recurrence φₖ₊₁ = (φₖ − 1/k!)/z beyond). */
export function phiFunctions(z: number): [number, number, number, number] {
  if (Math.abs(z) < 2) {
    const out: [number, number, number, number] = [0, 0, 0, 0];
    for (let k = 1; k <= 4; k++) {
      // 1/k! · (1 + z/(k+1) + z²/((k+1)(k+2)) + …): 25 terms reach full precision for |z| < 2.
      let term = 1, sum = 0;
      for (let m = 0; m < 25; m++) {
        sum += term;
        term *= z / (m + k + 1);
      }
      let f = 1;
      for (let i = 2; i <= k; i++) f *= i;
      out[k - 1] = sum / f;
    }
    return out;
  }
  const e = Math.exp(z);
  const p1 = (e - 1) / z;
  const p2 = (p1 - 1) / z;
  const p3 = (p2 - 0.5) / z;
  const p4 = (p3 - 1 / 6) / z;
  return [p1, p2, p3, p4];
}

/**
 * The cubic-hold discretization of a diagonal StateSpace over a step h, in closed form:
 * ∫₀ʰ e^(λ(h−t))·(t/h)ᵏ dt = h·k!·φₖ₊₁(λh). phi is the diagonal only (length n).
 */
export function discretizeModalCubic(ss: StateSpace, h: number): CubicHold {
  const n = ss.n;
  const phi = new Float64Array(n);
  const ge0 = new Float64Array(n), ge1 = new Float64Array(n), gd0 = new Float64Array(n), gd1 = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const z = ss.a[i * n + i] * h;
    const [p1, p2, p3, p4] = phiFunctions(z);
    phi[i] = Math.exp(z);
    // Integrals of σ⁰…σ³ against the mode, times b = 1.
    const g0 = h * p1, g1 = h * p2, g2 = 2 * h * p3, g3 = 6 * h * p4;
    ge0[i] = g0 - 3 * g2 + 2 * g3;
    ge1[i] = 3 * g2 - 2 * g3;
    gd0[i] = g1 - 2 * g2 + g3;
    gd1[i] = -g2 + g3;
  }
  return { phi, ge0, ge1, gd0, gd1 };
}
