/**
 * Small dense square matrices (row-major Float64Array) and the matrix exponential by
 * scaling and squaring with a [6/6] Padé approximant (Moler & Van Loan, "Nineteen dubious
 * ways…", 2003, method 3). Written here to keep the engine free of a linear-algebra bundle.
 */

export function identity(n: number): Float64Array {
  const m = new Float64Array(n * n);
  for (let i = 0; i < n; i++) m[i * n + i] = 1;
  return m;
}

export function matMul(a: Float64Array, b: Float64Array, n: number): Float64Array {
  return matMulInto(a, b, n, new Float64Array(n * n));
}

/** out = a·b (out must not be a or b); zero entries of a are skipped, as in sparse block matrices. */
function matMulInto(a: Float64Array, b: Float64Array, n: number, out: Float64Array): Float64Array {
  out.fill(0);
  for (let i = 0; i < n; i++) {
    const row = i * n;
    for (let k = 0; k < n; k++) {
      const aik = a[row + k];
      if (aik === 0) continue;
      const col = k * n;
      for (let j = 0; j < n; j++) out[row + j] += aik * b[col + j];
    }
  }
  return out;
}

/** Solves A·X = B for X (both n×n) by Gaussian elimination with partial pivoting. */
export function solve(a: Float64Array, b: Float64Array, n: number): Float64Array {
  return solveInPlace(Float64Array.from(a), Float64Array.from(b), n);
}

/** solve() overwriting a (with its elimination) and b (with the solution X). */
function solveInPlace(m: Float64Array, x: Float64Array, n: number): Float64Array {
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(m[r * n + c]) > Math.abs(m[p * n + c])) p = r;
    if (p !== c) {
      for (let j = 0; j < n; j++) {
        const mj = m[c * n + j]; m[c * n + j] = m[p * n + j]; m[p * n + j] = mj;
        const xj = x[c * n + j]; x[c * n + j] = x[p * n + j]; x[p * n + j] = xj;
      }
    }
    const piv = m[c * n + c];
    for (let r = c + 1; r < n; r++) {
      const f = m[r * n + c] / piv;
      if (f === 0) continue;
      for (let j = c; j < n; j++) m[r * n + j] -= f * m[c * n + j];
      for (let j = 0; j < n; j++) x[r * n + j] -= f * x[c * n + j];
    }
  }
  for (let c = n - 1; c >= 0; c--) {
    const piv = m[c * n + c];
    for (let j = 0; j < n; j++) {
      let s = x[c * n + j];
      for (let k = c + 1; k < n; k++) s -= m[c * n + k] * x[k * n + j];
      x[c * n + j] = s / piv;
    }
  }
  return x;
}

function infNorm(a: Float64Array, n: number): number {
  let best = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += Math.abs(a[i * n + j]);
    best = Math.max(best, s);
  }
  return best;
}

/**
 * e^A for an n×n matrix A (all NaN when A's norm is not finite). The squaring phase works on X = e^(A/2^s) − I (X ← 2X + X²), which
 * keeps slow modes of stiff models accurate where squaring e^(A/2^s) itself would lose digits.
 */
export function expm(a: Float64Array, n: number): Float64Array {
  const norm = infNorm(a, n);
  // Entries beyond the range of numbers: the exponential is not representable (and the number
  // of squarings would be unbounded); the caller sees NaN and reports it.
  if (!Number.isFinite(norm)) return new Float64Array(n * n).fill(NaN);
  const s = norm > 0.5 ? Math.max(0, Math.ceil(Math.log2(norm / 0.5))) : 0;
  const f = 2 ** -s;
  const size = n * n;
  const x = new Float64Array(size);
  for (let i = 0; i < size; i++) x[i] = a[i] * f;
  const q = 6;
  let c = 0.5;
  // Two buffers take turns holding X^k (and, later, the squares).
  let power: Float64Array = Float64Array.from(x);
  let spare: Float64Array = new Float64Array(size);
  const den = identity(n);
  // N − D = 2·Σ odd terms; D = Σ (−1)^k c_k X^k.
  const diff = new Float64Array(size);
  for (let i = 0; i < size; i++) {
    diff[i] = 2 * c * x[i];
    den[i] -= c * x[i];
  }
  let sign = -1;
  for (let k = 2; k <= q; k++) {
    c = (c * (q - k + 1)) / (k * (2 * q - k + 1));
    const next = matMulInto(power, x, n, spare);
    spare = power;
    power = next;
    sign = -sign;
    const odd = k % 2 === 1;
    for (let i = 0; i < size; i++) {
      den[i] += sign * c * power[i];
      if (odd) diff[i] += 2 * c * power[i];
    }
  }
  const e = solveInPlace(den, diff, n);
  for (let k = 0; k < s; k++) {
    const sq = matMulInto(e, e, n, spare);
    for (let i = 0; i < size; i++) e[i] = 2 * e[i] + sq[i];
  }
  for (let i = 0; i < n; i++) e[i * n + i] += 1;
  return e;
}
