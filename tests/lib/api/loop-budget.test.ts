import { describe, expect, it } from 'vitest';
import { ApiError } from '../../../src/lib/api/errors';
import { checkLoopBudget } from '../../../src/lib/api/loop-budget';
import { AnalyzeRequestSchema } from '../../../src/lib/api/schemas/analyze';

const pid = { form: 'ideal', kc: 2.1, ti: 11, td: 0.8, n: 10 };
const plant = { num: [1], den: [10, 1], delay: 2 };

function refusal(body: unknown): { field: string | undefined; code: string } | null {
  try {
    checkLoopBudget(AnalyzeRequestSchema.parse(body));
    return null;
  } catch (err) {
    if (err instanceof ApiError) return { field: err.field, code: err.code };
    throw err;
  }
}

describe('checkLoopBudget', () => {
  // Rows marked "found" are requests the fuzz test found to run for minutes or without end.
  it.each([
    { name: 'the worked HTST loop', body: { plant, sensor: { num: [1], den: [0.5, 1] }, controller: pid }, field: null },
    { name: 'a 10 µs sensor lag under 2 s of dead time (found)', body: { plant, sensor: { num: [1], den: [1e-5, 1] }, controller: pid }, field: 'sensor.den' },
    { name: 'a derivative filter of 0.1 µs (found)', body: { plant, controller: { ...pid, td: 1e-6 } }, field: 'controller.td' },
    { name: 'a dead time of 10^6 s on a 1 s lag (found)', body: { plant: { num: [1], den: [1, 1], delay: 1e6 }, controller: pid }, field: 'controller.td' },
    { name: 'a process gain of 10^11 with dead time (found)', body: { plant: { num: [1], den: [1e-11], delay: 2 }, controller: pid }, field: 'controller' },
    { name: 'a sensor gain of −1.5·10^52 (found)', body: { plant, sensor: { num: [-1.5e52], den: [0.5, 1] }, controller: pid }, field: 'controller' },
    { name: 'a fast lag in the third block of a series', body: { plant: [plant, { num: [1], den: [1, 1] }, { num: [1], den: [1e-6, 1] }], controller: pid }, field: 'plant.2.den' },
    { name: 'the same fast lag without dead time', body: { plant: { num: [1], den: [10, 1] }, sensor: { num: [1], den: [1e-6, 1] }, controller: pid }, field: null },
    { name: 'the same fast lag on an open path', body: { plant, sensor: { num: [1], den: [1e-6, 1] } }, field: null },
    { name: 'the fast lag when only margins are asked for', body: { plant, sensor: { num: [1], den: [1e-6, 1] }, controller: pid, analyses: { margins: true } }, field: null },
  ])('$name → $field', ({ body, field }) => {
    const out = refusal(body);
    if (field === null) expect(out).toBeNull();
    else expect(out).toEqual({ field, code: 'invalid_request' });
  });
});
