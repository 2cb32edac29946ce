/**
 * State-space realizations x' = A·x + B·u, y = C·x + D·u of proper transfer functions
 * (controllable canonical form, then diagonally balanced so that models with time constants
 * from milliseconds to hours keep their accuracy), and their exact discretization.
 */
import { ModelError, type TransferFunction } from './types';
import { expm } from './matrix';
import { checkStates } from './budget';

/** Single-input realization; A is n×n row-major, C has one row per output. */
export interface StateSpace {
  n: number;
  a: Float64Array;
  b: Float64Array;
  c: Float64Array[];
  d: number[];
  /** A is diagonal (a modal realization, modal.ts): steps may skip its off-diagonal zeros. */
  diagonal?: boolean;
}

/** Controllable canonical form of a proper rational G (the delay is ignored here). */
export function toStateSpace(g: TransferFunction): StateSpace {
  const n = g.den.length - 1;
  checkStates(n);
  if (g.num.length - 1 > n) {
    throw new ModelError('An improper transfer function has no state-space form; add a filter.', 'invalid_model');
  }
  const lead = g.den[0];
  const a = new Float64Array(n * n);
  const b = new Float64Array(n);
  const num = new Array<number>(n + 1 - g.num.length).fill(0).concat(g.num).map((v) => v / lead);
  const den = g.den.map((v) => v / lead);
  const c = new Float64Array(n);
  for (let j = 0; j < n; j++) {
    a[j] = -den[j + 1];
    c[j] = num[j + 1] - num[0] * den[j + 1];
  }
  for (let i = 1; i < n; i++) a[i * n + i - 1] = 1;
  if (n > 0) b[0] = 1;
  return balance({ n, a, b, c: [c], d: [num[0]] });
}

/** Diagonal similarity with powers of 2 (Parlett & Reinsch 1969) to even out row and column norms. */
function balance(ss: StateSpace): StateSpace {
  const { n, a } = ss;
  const scale = new Float64Array(n).fill(1);
  for (let sweep = 0; sweep < 50; sweep++) {
    let changed = false;
    for (let i = 0; i < n; i++) {
      let col = 0, row = 0;
      for (let j = 0; j < n; j++) {
        if (j === i) continue;
        col += Math.abs(a[j * n + i]);
        row += Math.abs(a[i * n + j]);
      }
      if (col === 0 || row === 0) continue;
      let f = 1;
      const total = col + row;
      while (col < row / 2) { col *= 2; row /= 2; f *= 2; }
      while (col >= row * 2) { col /= 2; row *= 2; f /= 2; }
      if (f !== 1 && (col + row) < 0.95 * total) {
        changed = true;
        scale[i] *= f;
        for (let j = 0; j < n; j++) { a[i * n + j] /= f; a[j * n + i] *= f; }
      }
    }
    if (!changed) break;
  }
  const b = ss.b.map((v, i) => v / scale[i]);
  const c = ss.c.map((row) => row.map((v, i) => v * scale[i]));
  return { n, a, b, c, d: ss.d };
}

/** a then b in series, keeping both outputs: c[0], d[0] after a; c[1], d[1] after b. */
export function cascade(first: StateSpace, second: StateSpace): StateSpace {
  const n = first.n + second.n;
  checkStates(n);
  const a = new Float64Array(n * n);
  const b = new Float64Array(n);
  const n1 = first.n;
  for (let i = 0; i < n1; i++) {
    for (let j = 0; j < n1; j++) a[i * n + j] = first.a[i * n1 + j];
    b[i] = first.b[i];
  }
  for (let i = 0; i < second.n; i++) {
    for (let j = 0; j < second.n; j++) a[(n1 + i) * n + n1 + j] = second.a[i * second.n + j];
    for (let j = 0; j < n1; j++) a[(n1 + i) * n + j] = second.b[i] * first.c[0][j];
    b[n1 + i] = second.b[i] * first.d[0];
  }
  const c1 = new Float64Array(n);
  const c2 = new Float64Array(n);
  for (let j = 0; j < n1; j++) {
    c1[j] = first.c[0][j];
    c2[j] = second.d[0] * first.c[0][j];
  }
  for (let j = 0; j < second.n; j++) c2[n1 + j] = second.c[0][j];
  const diagonal = first.diagonal === true && second.n === 0;
  return { n, a, b, c: [c1, c2], d: [first.d[0], second.d[0] * first.d[0]], ...(diagonal ? { diagonal } : {}) };
}

/**
 * Exact discretization over a step h for an input that is linear within the step
 * (first-order hold): x(k+1) = phi·x(k) + g0·u(k) + g1·u(k+1). With u(k+1) = u(k) this is
 * the zero-order hold, gamma = g0 + g1.
 */
export interface Discrete {
  phi: Float64Array;
  g0: Float64Array;
  g1: Float64Array;
}

export function discretizeStates(ss: StateSpace, h: number): Discrete {
  const n = ss.n;
  const m = n + 2;
  const big = new Float64Array(m * m);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) big[i * m + j] = ss.a[i * n + j] * h;
    big[i * m + n] = ss.b[i] * h;
  }
  big[n * m + n + 1] = 1;
  const e = expm(big, m);
  const phi = new Float64Array(n * n);
  const g0 = new Float64Array(n);
  const g1 = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) phi[i * n + j] = e[i * m + j];
    const zoh = e[i * m + n];
    const ramp = e[i * m + n + 1];
    g0[i] = zoh - ramp;
    g1[i] = ramp;
  }
  return { phi, g0, g1 };
}

/** State after time h from x0 = 0 under an impulse (e^(A·h)·B) — for exact delayed starts. */
export function impulseState(ss: StateSpace, h: number): Float64Array {
  const d = discretizeStates(ss, h);
  const out = new Float64Array(ss.n);
  for (let i = 0; i < ss.n; i++) {
    let s = 0;
    for (let j = 0; j < ss.n; j++) s += d.phi[i * ss.n + j] * ss.b[j];
    out[i] = s;
  }
  return out;
}

/**
 * Exact discretization over a step h for an input that is the cubic Hermite interpolant of its
 * end values e0, e1 and end slopes (times h) d0, d1:
 * x(k+1) = phi·x(k) + ge0·e0 + ge1·e1 + gd0·d0 + gd1·d1.
 */
export interface CubicHold {
  phi: Float64Array;
  ge0: Float64Array;
  ge1: Float64Array;
  gd0: Float64Array;
  gd1: Float64Array;
}

export function discretizeCubic(ss: StateSpace, h: number): CubicHold {
  const n = ss.n;
  const m = n + 4;
  // Augmented states w0..w3 = e and its derivatives in τ = t/h (w3 constant): exact for cubics.
  const big = new Float64Array(m * m);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) big[i * m + j] = ss.a[i * n + j] * h;
    big[i * m + n] = ss.b[i] * h;
  }
  for (let k = 0; k < 3; k++) big[(n + k) * m + n + k + 1] = 1;
  const e = expm(big, m);
  const phi = new Float64Array(n * n);
  const ge0 = new Float64Array(n), ge1 = new Float64Array(n), gd0 = new Float64Array(n), gd1 = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) phi[i * n + j] = e[i * m + j];
    // w(0) = (c0, c1, 2c2, 6c3) with c from the Hermite basis.
    const g0 = e[i * m + n], g1 = e[i * m + n + 1], g2 = 2 * e[i * m + n + 2], g3 = 6 * e[i * m + n + 3];
    ge0[i] = g0 - 3 * g2 + 2 * g3;
    ge1[i] = 3 * g2 - 2 * g3;
    gd0[i] = g1 - 2 * g2 + g3;
    gd1[i] = -g2 + g3;
  }
  return { phi, ge0, ge1, gd0, gd1 };
}
