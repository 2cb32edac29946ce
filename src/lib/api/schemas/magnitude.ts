/**
 * Every number the calculation routes take must lie within 1e−100 … 1e100 in magnitude (or be
 * 0): products and powers of numbers beyond that overflow or underflow inside the engine.
 */
export const MAX_MAGNITUDE = 1e100;

/** Whether x is 0 or within 1e−100 … 1e100 in magnitude. */
export function reasonableMagnitude(x: number): boolean {
  const a = Math.abs(x);
  return a === 0 || (a <= MAX_MAGNITUDE && a >= 1 / MAX_MAGNITUDE);
}

export function magnitudeMessage(x: number): string {
  return `The value ${x} is outside 1e-100 to 1e100 in magnitude; rescale (change its time or gain units).`;
}
