import { describe, expect, it } from 'vitest';
import { boundedCount, checkStates, MAX_STATE_STEPS, MAX_STATES, ModelBudget, stepLimit } from '../../../src/lib/control/budget';
import { modelErrorOf } from './helpers';

describe('boundedCount', () => {
  it.each([
    { count: 0, limit: 10, expected: 0 },
    { count: 9.2, limit: 10, expected: 10 },
    { count: 10, limit: 10, expected: 10 },
  ])('passes $count within $limit as $expected', ({ count, limit, expected }) => {
    expect(boundedCount(count, limit, 'too many', 'f')).toBe(expected);
  });

  it.each([11, Infinity, NaN, -1])('refuses %s with a ModelError naming the field', (count) => {
    const e = modelErrorOf(() => boundedCount(count, 10, 'too many', 'analyses.step.points'));
    expect(e).toMatchObject({ message: 'too many', code: 'invalid_request', field: 'analyses.step.points' });
  });
});

describe('ModelBudget', () => {
  it('allows spending up to its limit and refuses the next unit', () => {
    const b = new ModelBudget(3, 'spent', 'controller');
    b.spend(2);
    b.spend(1);
    const e = modelErrorOf(() => b.spend(1));
    expect(e).toMatchObject({ message: 'spent', field: 'controller' });
  });
});

describe('checkStates', () => {
  it('accepts MAX_STATES states and refuses one more at plant', () => {
    expect(() => checkStates(MAX_STATES)).not.toThrow();
    expect(modelErrorOf(() => checkStates(MAX_STATES + 1)).field).toBe('plant');
  });
});

describe('stepLimit', () => {
  it('keeps states² × steps within MAX_STATE_STEPS', () => {
    for (const n of [0, 1, 7, 20, 62, MAX_STATES]) {
      expect(stepLimit(n) * Math.max(1, n * n)).toBeLessThanOrEqual(MAX_STATE_STEPS);
      expect((stepLimit(n) + 1) * Math.max(1, n * n)).toBeGreaterThan(MAX_STATE_STEPS);
    }
  });
});
