/** Integral error criteria of a sampled error signal e(t) (trapezoidal rule; t in s). */

export interface ErrorIntegrals {
  /** ∫|e| dt */
  iae: number;
  /** ∫e² dt */
  ise: number;
  /** ∫t·|e| dt */
  itae: number;
}

/** IAE, ISE and ITAE; |e| is integrated exactly across sign changes of linear pieces. */
export function errorIntegrals(t: readonly number[], e: readonly number[]): ErrorIntegrals {
  let iae = 0, ise = 0, itae = 0;
  for (let k = 1; k < t.length; k++) {
    const h = t[k] - t[k - 1];
    const a = e[k - 1], b = e[k];
    ise += (h * (a * a + a * b + b * b)) / 3;
    if (a * b >= 0) {
      iae += (h * (Math.abs(a) + Math.abs(b))) / 2;
      itae += (h * (t[k - 1] * Math.abs(a) + t[k] * Math.abs(b))) / 2;
    } else {
      const tz = t[k - 1] + (h * a) / (a - b);
      const h1 = tz - t[k - 1], h2 = t[k] - tz;
      iae += (h1 * Math.abs(a) + h2 * Math.abs(b)) / 2;
      itae += (h1 * t[k - 1] * Math.abs(a) + h2 * t[k] * Math.abs(b)) / 2;
    }
  }
  return { iae, ise, itae };
}
