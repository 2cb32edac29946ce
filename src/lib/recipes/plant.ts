import { fromProcessModel } from '../control';
import type { ProcessModelInput } from '../schemas';

/** The transfer function of a recipe's process model, through the engine's model helpers. */
export function plantOf(model: ProcessModelInput): { num: number[]; den: number[]; delay: number } {
  if (model.type === 'tf') return { num: model.num, den: model.den, delay: model.delay ?? 0 };
  return fromProcessModel(model);
}
