import { describe, expect, it } from 'vitest';
import { expm } from '../../../src/lib/control/matrix';

describe('expm', () => {
  it('gives the rotation [[cos t, sin t], [−sin t, cos t]] for [[0, t], [−t, 0]] (closed form)', () => {
    const t = 7.3;
    const e = expm(Float64Array.from([0, t, -t, 0]), 2);
    expect(Array.from(e).map((v) => Number(v.toFixed(12)))).toEqual([Math.cos(t), Math.sin(t), -Math.sin(t), Math.cos(t)].map((v) => Number(v.toFixed(12))));
  });

  it('handles a Jordan block [[a, 1], [0, a]] → e^a·[[1, 1], [0, 1]] and a stiff diagonal', () => {
    const e = expm(Float64Array.from([-2, 1, 0, -2]), 2);
    expect(e[0]).toBeCloseTo(Math.exp(-2), 14);
    expect(e[1]).toBeCloseTo(Math.exp(-2), 14);
    expect(e[2]).toBe(0);
    const s = expm(Float64Array.from([-1e6, 0, 0, -1e-4]), 2);
    expect(s[0]).toBe(0);
    expect(s[3]).toBeCloseTo(Math.exp(-1e-4), 15);
  });
});
