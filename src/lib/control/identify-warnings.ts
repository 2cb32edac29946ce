/**
 * Plain-sentence cautions about a step-test fit that still produced numbers: a record too short
 * to show the gain, a dead time at the edge of the record, a poor match. Thresholds are common
 * practice (a first-order response is within 5 % of its final value after 3 time constants).
 */
import type { StepTest } from './identify-step';
import type { ProcessModel } from './types';

export function fitWarnings(model: ProcessModel, test: StepTest, r2: number): string[] {
  const warnings: string[] = [];
  const after = test.t[test.t.length - 1] - test.stepTime;
  if (model.type !== 'ipdt') {
    const lag = model.type === 'fopdt' ? model.tau : model.tau1 + model.tau2;
    const needed = model.theta + 3 * lag;
    if (after < needed) {
      warnings.push(
        `The record ends ${after.toPrecision(3)} s after the step, before θ + 3τ = ${needed.toPrecision(3)} s: the gain and time constant are extrapolated; record until the value settles.`,
      );
    }
  }
  if (model.theta > 0.9 * after) {
    warnings.push('The fitted dead time reaches the end of the record: the response to the step is barely visible.');
  }
  if (r2 < 0.9) {
    warnings.push(`The model matches the record poorly (R² = ${r2.toFixed(2)}); try another model type or check for disturbances during the test.`);
  }
  return warnings;
}
