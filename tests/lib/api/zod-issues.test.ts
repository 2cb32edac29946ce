import { z } from 'zod';
import { describe, expect, it } from 'vitest';
import { modelRoots } from '../../../src/lib/api/calc-route';
import { dottedPath, issueToApiError } from '../../../src/lib/api/zod-issues';

const Tf = z.object({ num: z.array(z.number()).min(1), den: z.array(z.number()).min(1) }).strict();
const Body = z
  .object({
    plant: z.union([Tf, z.array(Tf).min(1)]),
    controller: z.discriminatedUnion('form', [
      z.object({ form: z.literal('ideal'), kc: z.number() }).strict(),
      z.object({ form: z.literal('parallel'), kp: z.number() }).strict(),
    ]).optional(),
    points: z.int().min(2).max(100).optional(),
    input: z.enum(['setpoint', 'load']).optional(),
  })
  .strict()
  .superRefine((b, ctx) => {
    if (b.points === 13) ctx.addIssue({ code: 'custom', path: ['points'], params: { code: 'unlucky' }, message: 'Pick another count.' });
  });

function mapped(input: unknown) {
  const result = Body.safeParse(input);
  if (result.success) throw new Error('the schema accepted the input');
  const err = issueToApiError(result.error, input, modelRoots('plant'));
  return { status: err.status, code: err.code, field: err.field, message: err.message };
}

const tf = { num: [1], den: [1, 1] };

describe('issueToApiError', () => {
  const cases: { name: string; input: unknown; code: string; field: string | undefined; message: RegExp }[] = [
    { name: 'a missing required key', input: {}, code: 'invalid_request', field: 'plant', message: /^Give plant .*missing\.$/ },
    { name: 'a wrong type inside one transfer function', input: { plant: { num: [1], den: ['x'] } }, code: 'invalid_model', field: 'plant.den.0', message: /must be a number, not the text "x"/ },
    { name: 'a wrong type inside the second of a series', input: { plant: [tf, { num: [1], den: [true] }] }, code: 'invalid_model', field: 'plant.1.den.0', message: /plant\.1\.den\.0 must be a number, not true/ },
    { name: '"NaN" given as text', input: { plant: { num: [1], den: ['NaN'] } }, code: 'invalid_model', field: 'plant.den.0', message: /finite number.*JSON has no NaN/ },
    { name: 'an empty denominator', input: { plant: { num: [1], den: [] } }, code: 'invalid_model', field: 'plant.den', message: /must not be empty/ },
    { name: 'an unknown key at the top', input: { plant: tf, plnat: 1 }, code: 'invalid_request', field: 'plnat', message: /unknown key "plnat"/ },
    { name: 'an unknown key inside a model', input: { plant: { ...tf, Delay: 1 } }, code: 'invalid_request', field: 'plant.Delay', message: /unknown key "Delay"/ },
    { name: 'an unknown discriminator', input: { plant: tf, controller: { form: 'pd', kc: 1 } }, code: 'invalid_request', field: 'controller.form', message: /one of "ideal", "parallel", not the text "pd"/ },
    { name: 'a missing discriminator', input: { plant: tf, controller: { kc: 1 } }, code: 'invalid_request', field: 'controller.form', message: /^Give controller\.form/ },
    { name: 'a fraction where a whole number is needed', input: { plant: tf, points: 2.5 }, code: 'invalid_request', field: 'points', message: /whole number, not 2\.5/ },
    { name: 'a number above the maximum', input: { plant: tf, points: 1e7 }, code: 'invalid_request', field: 'points', message: /at most 100/ },
    { name: 'an option outside the enum', input: { plant: tf, input: 'disturbance' }, code: 'invalid_request', field: 'input', message: /one of "setpoint", "load"/ },
    { name: 'a refinement naming its own code', input: { plant: tf, points: 13 }, code: 'unlucky', field: 'points', message: /^Check points: pick another count\.$/ },
    { name: 'a body that is not an object', input: [1, 2], code: 'invalid_request', field: undefined, message: /^The request body must be an object, not a list\.$/ },
  ];
  it.each(cases)('maps $name to $code at $field', ({ input, code, field, message }) => {
    const out = mapped(input);
    expect(out.status).toBe(400);
    expect(out.code).toBe(code);
    expect(out.field).toBe(field);
    expect(out.message).toMatch(message);
  });

  it('writes every message as one sentence ending in a full stop', () => {
    for (const { input } of cases) {
      const { message } = mapped(input);
      expect(message).toMatch(/^[A-Za-z][^\n]*\.$/);
      expect(message).not.toMatch(/Invalid input|expected .* received/);
    }
  });
});

describe('dottedPath', () => {
  it('joins keys and indexes with dots and gives undefined for the root', () => {
    expect(dottedPath(['plant', 1, 'den', 0])).toBe('plant.1.den.0');
    expect(dottedPath([])).toBeUndefined();
  });
});
