import { describe, expect, it } from 'vitest';
import { gainToProportionalBand, integralTimeToRepeatsPerMinute, minutesToSeconds, proportionalBandToGain, repeatsPerMinuteToIntegralTime, secondsToMinutes } from '../../../src/lib/control/pid-units';

describe('gainToProportionalBand', () => {
  // Common practice (ISA terminology): PB % = 100 / gain.
  it('maps gain 2 to 50 % and back', () => {
    expect(gainToProportionalBand(2)).toBe(50);
    expect(proportionalBandToGain(50)).toBe(2);
    expect(() => gainToProportionalBand(0)).toThrow(/non-zero/);
  });
});

describe('integralTimeToRepeatsPerMinute', () => {
  // Common practice: repeats per minute = 1 / ti in minutes.
  it('maps ti = 30 s to 2 repeats/min and back; minutes and seconds convert by 60', () => {
    expect(integralTimeToRepeatsPerMinute(30)).toBe(2);
    expect(repeatsPerMinuteToIntegralTime(2)).toBe(30);
    expect(minutesToSeconds(1.5)).toBe(90);
    expect(secondsToMinutes(90)).toBe(1.5);
  });
});
