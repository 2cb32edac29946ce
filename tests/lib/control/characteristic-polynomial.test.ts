import { describe, expect, it } from 'vitest';
import { matrixCharacteristicPolynomial } from '../../../src/lib/control/characteristic-polynomial';

describe('matrixCharacteristicPolynomial', () => {
  const c = Math.cos(0.7);
  const s = Math.sin(0.7);
  const rows = [
    { name: 'diag(1, 2, 3): (x−1)(x−2)(x−3) = x³ − 6x² + 11x − 6', a: [[1, 0, 0], [0, 2, 0], [0, 0, 3]], expected: [1, -6, 11, -6] },
    { name: 'rotation by 0.7 rad: x² − 2cos(0.7)x + 1 (det 1, trace 2cos)', a: [[c, -s], [s, c]], expected: [1, -2 * c, 1] },
    { name: 'companion matrix of x⁴ + 2x³ − 3x² + 0.5x − 7 gives that polynomial back (definition)', a: [[-2, 3, -0.5, 7], [1, 0, 0, 0], [0, 1, 0, 0], [0, 0, 1, 0]], expected: [1, 2, -3, 0.5, -7] },
    { name: 'Jordan block of 0.5 (size 3): (x − 0.5)³', a: [[0.5, 1, 0], [0, 0.5, 1], [0, 0, 0.5]], expected: [1, -1.5, 0.75, -0.125] },
    { name: 'full 3×3 [[2,1,0],[1,3,1],[0,1,4]]: trace 9, principal minors 5+8+11 = 24, det 18', a: [[2, 1, 0], [1, 3, 1], [0, 1, 4]], expected: [1, -9, 24, -18] },
  ];
  it.each(rows)('$name', ({ a, expected }) => {
    const p = matrixCharacteristicPolynomial(a);
    expect(p.length).toBe(expected.length);
    p.forEach((v, i) => expect(v).toBeCloseTo(expected[i], 12));
  });
});
