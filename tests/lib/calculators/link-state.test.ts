import { describe, expect, it } from 'vitest';
import { LinkControllerSchema, LinkModelSchema } from '../../../src/lib/calculators/link-state';
import { PidControllerSchema } from '../../../src/lib/schemas/controller';
import { ProcessModelSchema } from '../../../src/lib/schemas/process-model';

/** Inputs both builds must judge alike: the link schemas mirror the concept schemas. */
const models: unknown[] = [
  { type: 'fopdt', k: 0.85, tau: 38, theta: 9 },
  { type: 'fopdt', k: -2, tau: 1e-3, theta: 0 },
  { type: 'fopdt', k: 0, tau: 38, theta: 9 },
  { type: 'fopdt', k: 1, tau: 0, theta: 9 },
  { type: 'fopdt', k: 1, tau: 5, theta: -1 },
  { type: 'fopdt', k: 1, tau: 5 },
  { type: 'fopdt', k: '1', tau: 5, theta: 1 },
  { type: 'fopdt', k: Number.POSITIVE_INFINITY, tau: 5, theta: 1 },
  { type: 'sopdt', k: 1, tau1: 30, tau2: 5, theta: 2 },
  { type: 'sopdt', k: 1, tau1: 5, tau2: 30, theta: 2 },
  { type: 'ipdt', k: 0.01, theta: 4 },
  { type: 'ipdt', k: 0.01 },
  { type: 'tf', num: [1], den: [10, 1], delay: 2 },
  { type: 'tf', num: [1], den: [10, 1] },
  { type: 'tf', num: [], den: [10, 1] },
  { type: 'tf', num: [1], den: [10, 1], delay: -2 },
  { type: 'lag', k: 1 },
  null,
  'fopdt',
  { type: 'fopdt', k: 1, tau: 5, theta: 1, extra: 'dropped' },
];

const controllers: unknown[] = [
  { form: 'ideal', kc: 1.9, ti: 38 },
  { form: 'ideal', kc: 1.9, ti: 38, td: 4, n: 8 },
  { form: 'ideal', kc: 1.9, ti: -1 },
  { form: 'ideal', kc: 1.9, n: 0 },
  { form: 'series', kc: 2.4, ti: 180, td: 30, n: 8 },
  { form: 'series', ti: 180 },
  { form: 'parallel', kp: 2, ki: 0.05, kd: 1, tf: 0.1 },
  { form: 'parallel', kp: 2, tf: -0.1 },
  { form: 'parallel', kc: 2 },
  { form: 'velocity', kc: 2 },
  {},
];

describe('LinkModelSchema', () => {
  for (const input of models) {
    it(`judges ${JSON.stringify(input)} as ProcessModelSchema does`, () => {
      const full = ProcessModelSchema.safeParse(input);
      const mini = LinkModelSchema.safeParse(input);
      expect(mini.success).toBe(full.success);
      if (full.success) expect(mini.data).toEqual(full.data);
    });
  }
});

describe('LinkControllerSchema', () => {
  for (const input of controllers) {
    it(`judges ${JSON.stringify(input)} as PidControllerSchema does`, () => {
      const full = PidControllerSchema.safeParse(input);
      const mini = LinkControllerSchema.safeParse(input);
      expect(mini.success).toBe(full.success);
      if (full.success) expect(mini.data).toEqual(full.data);
    });
  }
});
