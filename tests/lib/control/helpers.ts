import { expect } from 'vitest';
import { ModelError } from '../../../src/lib/control/types';

/** Relative closeness: |a − b| ≤ rel·|b| (or ≤ rel when b is 0). */
export function expectClose(actual: number, expected: number, rel: number): void {
  const scale = expected === 0 ? 1 : Math.abs(expected);
  expect(Math.abs(actual - expected), `${actual} vs ${expected}`).toBeLessThanOrEqual(rel * scale);
}

/** Runs fn and returns the ModelError it throws (fails the test if it throws nothing else). */
export function modelErrorOf(fn: () => unknown): ModelError {
  try {
    fn();
  } catch (error) {
    expect(error).toBeInstanceOf(ModelError);
    return error as ModelError;
  }
  throw new Error('expected a ModelError, got a result');
}

