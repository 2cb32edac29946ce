/**
 * Block connections of transfer functions. Dead times add in series; parallel paths and
 * feedback loops need equal or zero dead time to stay rational (a loop with dead time inside
 * is simulated and analysed by closed-loop.ts and stability.ts instead).
 */
import { ModelError, type TransferFunction } from './types';
import { add, multiply, scale, trim } from './polynomial';

/** a·b (signal through a, then b). */
export function series(a: TransferFunction, b: TransferFunction): TransferFunction {
  return { num: trim(multiply(a.num, b.num)), den: trim(multiply(a.den, b.den)), delay: a.delay + b.delay };
}

/** A chain of blocks as in a block diagram (actuator → process → measurement); [] gives 1. */
export function chain(blocks: readonly TransferFunction[]): TransferFunction {
  return blocks.reduce<TransferFunction>((acc, g) => series(acc, g), { num: [1], den: [1], delay: 0 });
}

/** a + b; both paths must have the same dead time. */
export function parallel(a: TransferFunction, b: TransferFunction): TransferFunction {
  if (a.delay !== b.delay) {
    throw new ModelError('Parallel paths with different dead times have no rational form; simulate them instead.', 'invalid_model');
  }
  return {
    num: add(multiply(a.num, b.den), multiply(b.num, a.den)),
    den: trim(multiply(a.den, b.den)),
    delay: a.delay,
  };
}

/**
 * g/(1 + g·h) for negative feedback (sign −1, the default) or g/(1 − g·h) for positive.
 * The loop must be free of dead time; the dead time of g alone may stay outside the loop
 * only if h has none and g's delay is zero, so any delay is refused here.
 */
export function feedback(g: TransferFunction, h: TransferFunction = { num: [1], den: [1], delay: 0 }, sign: -1 | 1 = -1): TransferFunction {
  if (g.delay !== 0 || h.delay !== 0) {
    throw new ModelError('A feedback loop with dead time has no rational form; use the closed-loop simulation.', 'invalid_model');
  }
  const open = multiply(g.num, h.num);
  const den = add(multiply(g.den, h.den), scale(open, -sign));
  if (den.every((c) => c === 0)) {
    throw new ModelError('The closed loop has a zero characteristic polynomial (1 + L = 0).', 'invalid_model');
  }
  return { num: trim(multiply(g.num, h.den)), den, delay: 0 };
}
