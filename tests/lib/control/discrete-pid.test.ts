import { describe, expect, it } from 'vitest';
import { discretePid } from '../../../src/lib/control/discrete-pid';
import fixtures from '../../reference/fixtures/discrete.json';
import { modelErrorOf } from './helpers';

function expectCoefficients(actual: number[], expected: number[], tol: number): void {
  const peak = Math.max(...expected.map(Math.abs));
  expect(actual.length, `${actual} vs ${expected}`).toBe(expected.length);
  actual.forEach((v, i) => expect(Math.abs(v - expected[i]), `${actual} vs ${expected}`).toBeLessThanOrEqual(tol * peak));
}

/** Runs the recursion the PLC would run and returns u for the error sequence e. */
function run(pid: ReturnType<typeof discretePid>, e: number[]): number[] {
  const u: number[] = [];
  const du: number[] = [];
  for (let k = 0; k < e.length; k++) {
    const x = pid.form === 'positional' ? u : du;
    let next = 0;
    pid.b.forEach((bj, j) => (next += bj * (e[k - j] ?? 0)));
    pid.a.slice(1).forEach((aj, j) => (next -= aj * (x[k - j - 1] ?? 0)));
    if (pid.form === 'positional') u.push(next);
    else {
      du.push(next);
      u.push((u[k - 1] ?? 0) + next);
    }
  }
  return u;
}

const source = fixtures.source;

describe('discretePid', () => {
  it.each(fixtures.controllers)(`matches ${source} backward_diff for $controller.form`, (row) => {
    const pid = discretePid(row.controller, row.ts);
    expectCoefficients(pid.transferFunction.num, row.backwardEuler.num, 1e-12);
    expectCoefficients(pid.transferFunction.den, row.backwardEuler.den, 1e-12);
  });

  it.each(fixtures.controllers)(`matches ${source} bilinear for $controller.form`, (row) => {
    const pid = discretePid(row.controller, row.ts, { method: 'tustin' });
    expectCoefficients(pid.transferFunction.num, row.tustin.num, 1e-12);
    expectCoefficients(pid.transferFunction.den, row.tustin.den, 1e-12);
  });

  it('gives a PI step of kc·(1 + ts/ti) then a ramp of kc·ts/ti per sample (backward-Euler integral, by hand)', () => {
    const pid = discretePid({ form: 'ideal', kc: 2, ti: 20 }, 0.5);
    const u = run(pid, new Array(5).fill(1));
    u.forEach((v, k) => expect(v).toBeCloseTo(2 + 2 * (0.5 / 20) * (k + 1), 12));
    expect(pid.equation).toBe('u[k] = 1·u[k−1] + 2.05·e[k] − 2·e[k−1]');
  });

  it.each([
    { name: 'ideal PID', controller: { form: 'ideal', kc: 2, ti: 10, td: 1.5, n: 10 } },
    { name: 'series PID', controller: { form: 'series', kc: 0.8, ti: 40, td: 4, n: 8 } },
    { name: 'PD without integral', controller: { form: 'parallel', kp: 1.2, kd: 3, tf: 0.4 } },
  ])('gives the same output in velocity and positional form for the $name (same C(z))', ({ controller }) => {
    const e = Array.from({ length: 40 }, (_, k) => Math.sin(0.3 * k) + (k > 10 ? 1 : 0));
    const p = run(discretePid(controller, 0.2), e);
    const v = run(discretePid(controller, 0.2, { form: 'velocity' }), e);
    v.forEach((x, k) => expect(x).toBeCloseTo(p[k], 9));
  });

  /** Runs the separate-term recursion of `terms`. */
  function runTerms(t: NonNullable<ReturnType<typeof discretePid>['terms']>, e: number[]): number[] {
    let i = 0;
    let d = 0;
    return e.map((ek, k) => {
      const prev = e[k - 1] ?? 0;
      i += t.i0 * ek + t.i1 * prev;
      d = t.ad * d + t.bd * (ek - prev);
      return t.kp * ek + i + d;
    });
  }

  it.each(
    fixtures.controllers.flatMap((row) => (['backward-euler', 'tustin'] as const).map((method) => ({ ...row, method }))),
  )('gives the same output from separate P, I, D terms as from C(z) for $controller.form, $method', ({ controller, ts, method }) => {
    const pid = discretePid(controller, ts, { method });
    expect(pid.terms).not.toBeNull();
    const e = Array.from({ length: 30 }, (_, k) => Math.cos(0.4 * k) + (k > 5 ? 1 : 0));
    const combined = run(pid, e);
    runTerms(pid.terms!, e).forEach((u, k) => expect(u).toBeCloseTo(combined[k], 9));
  });

  it('prints the separate terms of a PI as a PLC would run them', () => {
    expect(discretePid({ form: 'ideal', kc: 2, ti: 20 }, 0.5).terms!.equation).toBe('P[k] = 2·e[k]; I[k] = I[k−1] + 0.05·e[k]; u[k] = P[k] + I[k]');
  });

  it('writes the velocity form with the increment and its accumulation', () => {
    const pid = discretePid({ form: 'ideal', kc: 2, ti: 20 }, 0.5, { form: 'velocity' });
    expect(pid.a).toEqual([1]);
    expect(pid.equation).toBe('Δu[k] = 2.05·e[k] − 2·e[k−1]; u[k] = u[k−1] + Δu[k]');
  });

  it('takes an unfiltered derivative with backward Euler: kd·(e[k] − e[k−1])/ts', () => {
    const pid = discretePid({ form: 'parallel', kp: 0, kd: 2 }, 0.1);
    expectCoefficients(pid.b, [20, -20], 1e-12);
  });

  it.each([
    { why: 'Tustin of an unfiltered derivative', args: [{ form: 'parallel', kp: 1, kd: 2 }, 0.1, { method: 'tustin' }], field: 'controller.tf' },
    { why: 'a zero sample time', args: [{ form: 'ideal', kc: 1, ti: 5 }, 0, {}], field: 'ts' },
    { why: 'an unknown form', args: [{ form: 'pidf', kc: 1 }, 1, {}], field: 'controller.form' },
    { why: 'an unknown option', args: [{ form: 'ideal', kc: 1 }, 1, { antiWindup: true }], field: 'options' },
  ])('refuses $why with invalid_request', ({ args, field }) => {
    const [c, ts, o] = args as [unknown, number, object];
    const error = modelErrorOf(() => discretePid(c, ts, o));
    expect(error.code).toBe('invalid_request');
    expect(error.field).toBe(field);
  });
});
