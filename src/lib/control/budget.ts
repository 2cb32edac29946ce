/**
 * Work budgets: every entry point of the engine bounds its own work (internal steps, frequency
 * evaluations, array sizes) so that no request can hang a thread or exhaust memory. A request
 * that would exceed a budget is refused with a ModelError that says why, naming the field.
 */
import { ModelError } from './types';

/** Most frequency evaluations one Nyquist stability test may spend. */
export const MAX_TURN_REFINEMENTS = 2_000_000;

/** Most samples of any array the engine allocates from a count a request decides. */
export const MAX_SAMPLES = 10_000_000;

/**
 * Most states of one state-space realization (all blocks of a loop together). A time response
 * of higher order comes from a polynomial expanded so far that its coefficients no longer hold
 * the roots, and each step costs n² operations.
 */
export const MAX_STATES = 80;

/** Most state-steps (states² × steps) one simulation may take: about 0.05 s of arithmetic. */
export const MAX_STATE_STEPS = 50_000_000;

/** Refuses a realization of more than MAX_STATES states (field `plant`). */
export function checkStates(n: number): void {
  if (n > MAX_STATES) {
    throw new ModelError(
      `The loop's blocks together have order ${n}; time responses are computed for at most ${MAX_STATES} states, so reduce the model (fewer or lower-order blocks).`,
      'invalid_request',
      'plant',
    );
  }
}

/** Most fixed steps a simulation of n states may take within MAX_STATE_STEPS. */
export function stepLimit(n: number): number {
  return Math.floor(MAX_STATE_STEPS / Math.max(1, n * n));
}

/** A counter that throws ModelError(message, 'invalid_request', field) once more than `limit` is spent. */
export class ModelBudget {
  private used = 0;
  constructor(
    private readonly limit: number,
    private readonly message: string,
    private readonly field: string,
  ) {}

  spend(amount: number): void {
    this.used += amount;
    if (this.used > this.limit) throw new ModelError(this.message, 'invalid_request', this.field);
  }
}

/**
 * A count that sizes an allocation or a loop: a whole number from 0 to `limit`, else
 * ModelError(message, 'invalid_request', field). Guards against NaN and Infinity too.
 */
export function boundedCount(count: number, limit: number, message: string, field: string): number {
  if (!(count >= 0 && count <= limit)) throw new ModelError(message, 'invalid_request', field);
  return Math.ceil(count);
}
