import { describe, expect, it } from 'vitest';
import { describeSetting, fromPidController, toPidController } from '../../../src/lib/fielddata/tuning-setting';

describe('toPidController', () => {
  // Unit conversions are definitions: 1 min = 60 s; ki in 1/min becomes ki/60 in 1/s.
  it('turns minutes into seconds for ideal and series forms', () => {
    expect(toPidController({ form: 'series', gain: 1.8, integral: 2.5, derivative: 0.5, timeUnit: 'min', gainUnit: '%/%' })).toEqual({ form: 'series', kc: 1.8, ti: 150, td: 30 });
  });
  it('turns ki per minute into ki per second and kd in minutes into seconds for the parallel form', () => {
    expect(toPidController({ form: 'parallel', gain: 2, integral: 6, derivative: 0.1, timeUnit: 'min', gainUnit: '%/%' })).toEqual({ form: 'parallel', kp: 2, ki: 0.1, kd: 6 });
  });
  it('reads no integral action as ti 0 (the contract: zero means none)', () => {
    expect(toPidController({ form: 'ideal', gain: 3, integral: null, derivative: null, timeUnit: 's', gainUnit: '%/%' })).toEqual({ form: 'ideal', kc: 3, ti: 0, td: 0 });
  });
});

describe('fromPidController', () => {
  it('is the inverse of toPidController', () => {
    const s = fromPidController({ form: 'ideal', kc: 0.9, ti: 90, td: 12 }, 'min', '%/°C');
    expect(s).toEqual({ form: 'ideal', gain: 0.9, integral: 1.5, derivative: 0.2, timeUnit: 'min', gainUnit: '%/°C' });
    expect(toPidController(s)).toEqual({ form: 'ideal', kc: 0.9, ti: 90, td: 12 });
  });
});

describe('describeSetting', () => {
  it('names the values with their units and form', () => {
    expect(describeSetting({ form: 'series', gain: 1.8, integral: 2.5, derivative: null, timeUnit: 'min', gainUnit: '%/%' })).toBe('Kc 1.8 %/%, Ti 2.5 min, Td 0 min (series)');
  });
});
