/** Evenly spaced time grids (s). */
import { ModelError } from './types';

/** points samples evenly spaced from 0 to tFinal inclusive. */
export function timeGrid(tFinal: number, points: number): number[] {
  const dt = tFinal / (points - 1);
  const t = new Array<number>(points);
  for (let k = 0; k < points - 1; k++) t[k] = k * dt;
  t[points - 1] = tFinal;
  return t;
}

/** The common spacing of an evenly spaced grid; throws when the grid is not evenly spaced. */
export function gridStep(t: readonly number[], field = 't'): number {
  if (t.length < 2) throw new ModelError('A time grid needs at least two samples.', 'invalid_request', field);
  const dt = (t[t.length - 1] - t[0]) / (t.length - 1);
  if (!(dt > 0) || !Number.isFinite(dt)) throw new ModelError('Times must increase.', 'invalid_request', field);
  for (let k = 1; k < t.length; k++) {
    if (Math.abs(t[k] - t[0] - k * dt) > 1e-6 * dt) {
      throw new ModelError('Times must be evenly spaced (one sample step throughout).', 'invalid_request', `${field}.${k}`);
    }
  }
  return dt;
}
