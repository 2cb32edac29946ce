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
