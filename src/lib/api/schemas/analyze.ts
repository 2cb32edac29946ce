import { z } from 'zod';
import { IdealPidSchema, ParallelPidSchema, SeriesPidSchema } from '../../schemas';
import { ProperTransferFunctionSchema } from './transfer-function';

/** Most samples a step response may ask for (the contract's limit). */
export const MAX_POINTS = 100_000;
/** Most frequencies one request may ask for. */
export const MAX_FREQUENCIES = 100_000;
/** Most transfer functions in series in `plant`. */
export const MAX_SERIES = 10;

/** A PID controller in one of the contract's three forms; unknown keys (a typo like `Ti`) are refused. */
export const ControllerRequestSchema = z
  .discriminatedUnion('form', [IdealPidSchema.strict(), SeriesPidSchema.strict(), ParallelPidSchema.strict()])
  .meta({ id: 'PidController', description: 'ideal, series or parallel PID; times in s.' });

export const StepRequestSchema = z
  .object({
    /** End of the simulated horizon, s; chosen so the response settles when absent. */
    tFinal: z.number().positive().optional(),
    /** Evenly spaced samples from 0 to tFinal inclusive. */
    points: z.int().min(2).max(MAX_POINTS).default(1001),
    /** Which unit step: the setpoint (Y/R) or a load at the plant input (Y/D). */
    input: z.enum(['setpoint', 'load']).default('setpoint'),
  })
  .strict()
  .meta({ description: 'Closed-loop (or open-path) unit step response; tFinal in s.' });

export const FrequencyRequestSchema = z
  .object({
    /** Frequencies in rad/s, each finite and > 0. */
    w: z.array(z.number().positive()).min(1).max(MAX_FREQUENCIES),
  })
  .strict();

export const AnalysesRequestSchema = z
  .object({
    step: StepRequestSchema.optional(),
    frequency: FrequencyRequestSchema.optional(),
    /** Gain and phase margins, delay margin and peak sensitivity of L. */
    margins: z.boolean().optional(),
    /** Poles and zeros of the rational part, and closed-loop stability. */
    poles: z.boolean().optional(),
  })
  .strict();

/** The body of POST /api/v1/calc/analyze. */
export const AnalyzeRequestSchema = z
  .object({
    /** One transfer function, or several in series. */
    plant: z.union([ProperTransferFunctionSchema, z.array(ProperTransferFunctionSchema).min(1).max(MAX_SERIES)]),
    /** Measurement path H(s) in the feedback loop; default 1. */
    sensor: ProperTransferFunctionSchema.optional(),
    /** Without it, everything is of the open path G·H. */
    controller: ControllerRequestSchema.optional(),
    analyses: AnalysesRequestSchema.default({}),
  })
  .strict()
  .meta({ id: 'AnalyzeRequest' });

export type AnalyzeRequest = z.output<typeof AnalyzeRequestSchema>;
