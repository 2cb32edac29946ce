import { describe, expect, it } from 'vitest';
import { ageQuery, tuningAge } from '../../../src/lib/fielddata/tuning-age';

const now = new Date('2026-12-02T01:00:00Z');

describe('ageQuery', () => {
  it.each([
    ['lt1y', { tunedSince: '2025-12-02' }],
    ['1to3y', { tunedSince: '2023-12-02', tunedBefore: '2025-12-02' }],
    ['gt3y', { tunedBefore: '2023-12-02' }],
    ['unknown', { untuned: 'true' }],
    ['whatever', {}],
  ])('%s filters by %j', (bucket, query) => expect(ageQuery(bucket, now)).toEqual(query));
});

describe('tuningAge', () => {
  it.each([
    ['2026-12-01', '1 day'],
    ['2026-10-01', '2 months'],
    ['2025-06-01', '18 months'],
    ['2021-11-30', '5 years'],
  ])('%s was %s ago', (date, words) => expect(tuningAge(date, now)).toBe(words));
});
