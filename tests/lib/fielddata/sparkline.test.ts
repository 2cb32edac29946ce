import { describe, expect, it } from 'vitest';
import { sparkPaths, thinIndices } from '../../../src/lib/fielddata/sparkline';

describe('sparkPaths', () => {
  it('maps the data range onto the box, y upwards, both series on one scale', () => {
    const box = { width: 100, height: 50, pad: 0 };
    expect(sparkPaths([0, 5, 10], [[0, 1, 2], [2, 2, 2]], box)).toEqual(['M0 50L50 25L100 0', 'M0 0L50 0L100 0']);
  });
  it('draws a flat line mid-free (at the bottom) rather than dividing by zero', () => {
    expect(sparkPaths([0, 1], [[3, 3]], { width: 10, height: 10, pad: 0 })).toEqual(['M0 10L10 10']);
  });
});

describe('thinIndices', () => {
  it('keeps the first and last sample and at most max', () => {
    expect(thinIndices(11, 3)).toEqual([0, 5, 10]);
    expect(thinIndices(3, 10)).toEqual([0, 1, 2]);
  });
});
