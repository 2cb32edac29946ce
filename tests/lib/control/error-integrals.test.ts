import { describe, expect, it } from 'vitest';
import { errorIntegrals } from '../../../src/lib/control/error-integrals';
import { timeGrid } from '../../../src/lib/control/time-grid';

describe('errorIntegrals', () => {
  it('integrates e = e^(−t/τ): IAE = τ, ISE = τ/2, ITAE = τ² (closed forms), rel 1e-5', () => {
    const tau = 4;
    const t = timeGrid(40 * tau, 40001);
    const r = errorIntegrals(t, t.map((x) => Math.exp(-x / tau)));
    expect(r.iae / tau).toBeCloseTo(1, 5);
    expect(r.ise / (tau / 2)).toBeCloseTo(1, 5);
    expect(r.itae / (tau * tau)).toBeCloseTo(1, 5);
  });

  it('integrates |e| exactly across a sign change of a linear piece', () => {
    // e from 1 to −1 over [0, 2]: IAE = 1 (two triangles), ISE = 2/3.
    const r = errorIntegrals([0, 2], [1, -1]);
    expect(r.iae).toBeCloseTo(1, 14);
    expect(r.ise).toBeCloseTo(2 / 3, 14);
  });
});
