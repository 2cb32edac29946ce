import { z } from 'zod';
import { IdealPidSchema, ParallelPidSchema, SeriesPidSchema } from '../../schemas';
import { magnitudeMessage, reasonableMagnitude } from './magnitude';
import { ProperTransferFunctionSchema } from './transfer-function';

/** Most samples a step response may ask for (the contract's limit). */
export const MAX_POINTS = 100_000;
/** Most frequencies one request may ask for. */
export const MAX_FREQUENCIES = 100_000;
/** Most transfer functions in series in `plant` (the engine's limit). */
export const MAX_SERIES = 20;

/** A PID controller in one of the contract's three forms; unknown keys (a typo like `Ti`) are refused. */
export const ControllerRequestSchema = z
  .discriminatedUnion('form', [IdealPidSchema.strict(), SeriesPidSchema.strict(), ParallelPidSchema.strict()])
  .superRefine((c, ctx) => {
    for (const [key, value] of Object.entries(c)) {
      if (typeof value === 'number' && !reasonableMagnitude(value)) {
        ctx.addIssue({ code: 'custom', path: [key], message: magnitudeMessage(value) });
        return;
      }
    }
  })
  .meta({ id: 'PidController', description: 'ideal, series or parallel PID; times in s.' });

export const StepRequestSchema = z
  .object({
    /** End of the simulated horizon, s; chosen so the response settles when absent. */
    tFinal: z.number().positive().max(1e100).optional(),
    /** Evenly spaced samples from 0 to tFinal inclusive. */
    points: z.int().min(2).max(MAX_POINTS).default(1001),
    /** Which unit step: the setpoint (Y/R) or a load at the plant input (Y/D). */
    input: z.enum(['setpoint', 'load']).default('setpoint'),
  })
  .strict()
  .meta({ description: 'Closed-loop (or open-path) unit step response; tFinal in s.' });

export const FrequencyRequestSchema = z
  .object({
    /** Frequencies in rad/s, each finite and > 0; an automatic logarithmic grid when absent. */
    w: z.array(z.number().positive().max(1e100).refine(reasonableMagnitude, 'Frequencies must lie within 1e-100 to 1e100 rad/s.')).min(1).max(MAX_FREQUENCIES).optional(),
    /** Points of the automatic grid (default 200) when w is absent. */
    points: z.int().min(2).max(MAX_FREQUENCIES).optional(),
  })
  .strict()
  .meta({ description: 'Frequency response of L (or G·H); w in rad/s.' });

export const AnalysesRequestSchema = z
  .object({
    /** true for the defaults, or the settings. */
    step: z.union([z.boolean(), StepRequestSchema]).optional(),
    /** true for the automatic grid, or the settings. */
    frequency: z.union([z.boolean(), FrequencyRequestSchema]).optional(),
    /** Gain and phase margins, delay margin and peak sensitivity of L. */
    margins: z.boolean().optional(),
    /** Poles and zeros of the rational part, and closed-loop stability. */
    poles: z.boolean().optional(),
  })
  .strict()
  .meta({ description: 'What to compute; when absent, every analysis runs with its defaults.' });

/** The body of POST /api/v1/calc/analyze. */
export const AnalyzeRequestSchema = z
  .object({
    /** One transfer function, or several in series. */
    plant: z.union([ProperTransferFunctionSchema, z.array(ProperTransferFunctionSchema).min(1).max(MAX_SERIES)]),
    /** Measurement path H(s) in the feedback loop; default 1. */
    sensor: ProperTransferFunctionSchema.optional(),
    /** Without it, everything is of the open path G·H. */
    controller: ControllerRequestSchema.optional(),
    analyses: AnalysesRequestSchema.optional(),
  })
  .strict()
  .meta({ id: 'AnalyzeRequest' });

export type AnalyzeRequest = z.output<typeof AnalyzeRequestSchema>;
