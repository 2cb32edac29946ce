/**
 * Characteristic polynomial of a small dense matrix (arrays of rows, at most 20×20), for turning
 * a discrete state-space model back into a transfer function. Written here because no small,
 * well-kept package does it and the engine must stay light in islands.
 */
export type Matrix = number[][];

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
export function matrixCharacteristicPolynomial(a: Matrix): number[] {
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
