/**
 * The trade's units for controller settings. Proportional band PB (%) = 100 / gain
 * (gain as a plain ratio of spans); integral action in repeats per minute = 60 / ti (ti in s).
 */
import { ModelError } from './types';

function nonZero(value: number, what: string): void {
  if (!Number.isFinite(value) || value === 0) throw new ModelError(`${what} must be a finite, non-zero number.`, 'invalid_request');
}

/** Proportional band in % from a controller gain (plain ratio). */
export function gainToProportionalBand(kc: number): number {
  nonZero(kc, 'The gain');
  return 100 / kc;
}

/** Controller gain (plain ratio) from a proportional band in %. */
export function proportionalBandToGain(pbPct: number): number {
  nonZero(pbPct, 'The proportional band');
  return 100 / pbPct;
}

/** Repeats per minute from an integral time in s. */
export function integralTimeToRepeatsPerMinute(tiSeconds: number): number {
  nonZero(tiSeconds, 'The integral time');
  return 60 / tiSeconds;
}

/** Integral time in s from repeats per minute. */
export function repeatsPerMinuteToIntegralTime(repeatsPerMinute: number): number {
  nonZero(repeatsPerMinute, 'The integral rate');
  return 60 / repeatsPerMinute;
}

/** Minutes to seconds (integral or derivative time). */
export function minutesToSeconds(minutes: number): number {
  return minutes * 60;
}

/** Seconds to minutes (integral or derivative time). */
export function secondsToMinutes(seconds: number): number {
  return seconds / 60;
}
