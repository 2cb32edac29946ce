/**
 * Small dense linear algebra for discretization: matrix exponential and characteristic
 * polynomial. Written here because the engine must stay free of heavy numeric packages in
 * islands; matrices are at most (20+1)×(20+1). Matrices are arrays of rows.
 */
export type Matrix = number[][];

export function identity(n: number): Matrix {
  return Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)));
}

export function multiply(a: Matrix, b: Matrix): Matrix {
  const n = a.length;
  const m = b[0]?.length ?? 0;
  const out = Array.from({ length: n }, () => new Array<number>(m).fill(0));
  for (let i = 0; i < n; i++) {
    for (let k = 0; k < b.length; k++) {
      const aik = a[i][k];
      if (aik === 0) continue;
      for (let j = 0; j < m; j++) out[i][j] += aik * b[k][j];
    }
  }
  return out;
}

/** a + c·b, element by element. */
export function addScaled(a: Matrix, b: Matrix, c: number): Matrix {
  return a.map((row, i) => row.map((v, j) => v + c * b[i][j]));
}

function norm1(a: Matrix): number {
  let best = 0;
  for (let j = 0; j < a.length; j++) {
    let sum = 0;
    for (let i = 0; i < a.length; i++) sum += Math.abs(a[i][j]);
    best = Math.max(best, sum);
  }
  return best;
}

/** X with A·X = B by Gaussian elimination with partial pivoting. */
export function solve(a: Matrix, b: Matrix): Matrix {
  const n = a.length;
  const m = a.map((row, i) => [...row, ...b[i]]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r][col]) > Math.abs(m[pivot][col])) pivot = r;
    [m[col], m[pivot]] = [m[pivot], m[col]];
    const p = m[col][col];
    if (p === 0) throw new Error('singular matrix');
    for (let r = col + 1; r < n; r++) {
      const f = m[r][col] / p;
      if (f === 0) continue;
      for (let c = col; c < m[r].length; c++) m[r][c] -= f * m[col][c];
    }
  }
  const width = b[0].length;
  const x = Array.from({ length: n }, () => new Array<number>(width).fill(0));
  for (let r = n - 1; r >= 0; r--) {
    for (let c = 0; c < width; c++) {
      let sum = m[r][n + c];
      for (let k = r + 1; k < n; k++) sum -= m[r][k] * x[k][c];
      x[r][c] = sum / m[r][r];
    }
  }
  return x;
}

/**
 * e^A by scaling and squaring with the diagonal [6/6] Padé approximant (Golub & Van Loan,
 * Matrix Computations, 3rd ed., Algorithm 11.3.1): scale so that ‖A/2^j‖₁ ≤ 1/2, where the
 * [6/6] error bound is below 1e-16, then square j times.
 */
export function expm(a: Matrix): Matrix {
  const n = a.length;
  const j = Math.max(0, Math.ceil(Math.log2(norm1(a) / 0.5)));
  const x0 = a.map((row) => row.map((v) => v / 2 ** j));
  const q = 6;
  let c = 1;
  let x = identity(n);
  let numer = identity(n);
  let denom = identity(n);
  for (let k = 1; k <= q; k++) {
    c = (c * (q - k + 1)) / (k * (2 * q - k + 1));
    x = multiply(x0, x);
    numer = addScaled(numer, x, c);
    denom = addScaled(denom, x, k % 2 === 0 ? c : -c);
  }
  let e = solve(denom, numer);
  for (let k = 0; k < j; k++) e = multiply(e, e);
  return e;
}

/** Upper Hessenberg matrix similar to A (Householder reflections; same eigenvalues). */
function hessenberg(a: Matrix): Matrix {
  const h = a.map((row) => row.slice());
  const n = h.length;
  for (let k = 0; k < n - 2; k++) {
    let alpha = 0;
    for (let i = k + 1; i < n; i++) alpha += h[i][k] ** 2;
    alpha = Math.sqrt(alpha);
    if (alpha === 0) continue;
    if (h[k + 1][k] > 0) alpha = -alpha;
    const v = new Array<number>(n).fill(0);
    v[k + 1] = h[k + 1][k] - alpha;
    for (let i = k + 2; i < n; i++) v[i] = h[i][k];
    const vv = v.reduce((s, x) => s + x * x, 0);
    if (vv === 0) continue;
    // H ← (I − 2vvᵀ/vᵀv) H (I − 2vvᵀ/vᵀv)
    for (let col = 0; col < n; col++) {
      let dot = 0;
      for (let i = k + 1; i < n; i++) dot += v[i] * h[i][col];
      const f = (2 * dot) / vv;
      for (let i = k + 1; i < n; i++) h[i][col] -= f * v[i];
    }
    for (let row = 0; row < n; row++) {
      let dot = 0;
      for (let i = k + 1; i < n; i++) dot += h[row][i] * v[i];
      const f = (2 * dot) / vv;
      for (let i = k + 1; i < n; i++) h[row][i] -= f * v[i];
    }
  }
  return h;
}

/**
 * Monic characteristic polynomial det(xI − A), descending powers of x, by Hessenberg reduction
 * and the La Budde recurrence (Wilkinson, The Algebraic Eigenvalue Problem, §6.57): stable where
 * Faddeev–LeVerrier is not.
 */
export function characteristicPolynomial(a: Matrix): number[] {
  const n = a.length;
  const h = hessenberg(a);
  // p[k] is the characteristic polynomial of the leading k×k block, ascending storage.
  const p: number[][] = [[1]];
  for (let k = 1; k <= n; k++) {
    const kk = k - 1;
    // (x − h_kk)·p_{k−1}
    const prev = p[k - 1];
    const next = new Array<number>(k + 1).fill(0);
    for (let i = 0; i < prev.length; i++) {
      next[i + 1] += prev[i];
      next[i] -= h[kk][kk] * prev[i];
    }
    let sub = 1;
    for (let i = kk - 1; i >= 0; i--) {
      sub *= h[i + 1][i];
      const f = h[i][kk] * sub;
      if (f === 0) continue;
      const q = p[i];
      for (let c = 0; c < q.length; c++) next[c] -= f * q[c];
    }
    p.push(next);
  }
  return p[n].slice().reverse();
}
