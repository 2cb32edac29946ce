/**
 * Indices of at most `max` samples, evenly strided, always keeping the samples on either side of
 * the step in u (the step instant fixes the dead time, so it must survive thinning) and the last.
 */
export function decimateIndices(n: number, max: number, u: number[] | null): number[] {
  if (n <= max) return Array.from({ length: n }, (_, i) => i);
  const stride = Math.ceil(n / max);
  const keep = new Set<number>();
  for (let i = 0; i < n; i += stride) keep.add(i);
  keep.add(n - 1);
  const step = u ? stepIndex(u) : -1;
  if (step > 0) {
    keep.add(step - 1);
    keep.add(step);
  }
  return [...keep].sort((a, b) => a - b);
}

/** First sample farther than half the overall step from the starting level, or -1. */
export function stepIndex(u: number[]): number {
  const size = u[u.length - 1] - u[0];
  if (size === 0) return -1;
  return u.findIndex((v) => Math.abs(v - u[0]) > Math.abs(size) / 2);
}

/** Picks the given indices from an array. */
export function pick<T>(values: T[], indices: number[]): T[] {
  return indices.map((i) => values[i]);
}
