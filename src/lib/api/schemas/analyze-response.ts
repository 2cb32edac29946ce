import { z } from 'zod';

/** A number, or null where the contract says the figure is undefined. */
const maybe = (description: string) => z.number().nullable().meta({ description });

export const StepInfoSchema = z.looseObject({
  finalValue: maybe('Steady-state value; null when unstable or integrating.'),
  riseTime: maybe('s, from first reaching 10 % to first reaching 90 % of finalValue.'),
  settlingTime: maybe('s from t = 0, the last time |y − finalValue| > 2 % of |finalValue|; null if not settled by tFinal.'),
  overshootPct: maybe('max(0, (peak − finalValue)/finalValue·100).'),
  peak: maybe('Largest y (most negative for a negative finalValue).'),
  peakTime: maybe('s, the time of peak.'),
});

export const StepResponseSchema = z.looseObject({
  /** Sample times, s, evenly spaced from 0 to tFinal. */
  t: z.array(z.number()),
  /** Response at each sample. */
  y: z.array(z.number()),
  info: StepInfoSchema,
});

export const FrequencyResponseSchema = z.looseObject({
  /** rad/s. */
  w: z.array(z.number()),
  /** |L(jw)|, plain ratio. */
  mag: z.array(z.number()),
  /** Continuous phase, degrees, dead time included. */
  phaseDeg: z.array(z.number()),
});

export const MarginsSchema = z.looseObject({
  gainMargin: maybe('1/|L| at the phase crossover, plain ratio.'),
  gainMarginDb: maybe('gainMargin in dB.'),
  phaseCrossover: maybe('rad/s, lowest w > 0 where the phase crosses −180° (mod 360).'),
  phaseMarginDeg: maybe('degrees, 180 + phase at the gain crossover, in (−180, 180].'),
  gainCrossover: maybe('rad/s, lowest w > 0 where |L| crosses 1.'),
  delayMargin: maybe('s, phase margin (rad) / gainCrossover.'),
  ms: z.number().meta({ description: 'Peak sensitivity, max over w of 1/|1 + L(jw)|.' }),
});

const ComplexSchema = z.looseObject({ re: z.number(), im: z.number() });

/** The answer of POST /api/v1/calc/analyze; each part present when it was asked for. */
export const AnalyzeResponseSchema = z
  .looseObject({
    step: StepResponseSchema.optional(),
    frequency: FrequencyResponseSchema.optional(),
    margins: MarginsSchema.optional(),
    poles: z.array(ComplexSchema).optional(),
    zeros: z.array(ComplexSchema).optional(),
    /** Closed loop (with a controller) or open path asymptotically stable, dead time exact. */
    stable: z.boolean().optional(),
  })
  .meta({ id: 'AnalyzeResponse' });
