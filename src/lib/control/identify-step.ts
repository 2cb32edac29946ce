/**
 * Reading an open-loop step test: checking the samples and finding the step in u.
 * The step instant is the first sample at which u has its new value (api-v1.md).
 */
import { z } from 'zod';
import { parseRequest } from './request-error';
import { ModelError } from './types';

const samples = z.array(z.number()).max(100_000, 'At most 100000 samples are accepted.');

export const IdentifyRequestSchema = z.object({
  /** Sample times in s, strictly increasing. */
  t: samples.min(10, 'A step test needs at least 10 samples.'),
  /** Measured process value, one per sample, in its engineering unit. */
  y: samples,
  /** Controller output (manipulated variable), one per sample, holding a single step; absent = unit step at t = 0. */
  u: samples.optional(),
  /** The model to fit. */
  model: z.enum(['fopdt', 'sopdt', 'ipdt']),
});
export type IdentifyRequest = z.infer<typeof IdentifyRequestSchema>;

/** A validated step test, its step instant (s) and size (u units), and the pre-step level of y. */
export interface StepTest {
  t: number[];
  y: number[];
  stepTime: number;
  stepSize: number;
  /** Index of the first sample at or after the step. */
  stepIndex: number;
}

/** Share of the step size that u may wander around its two levels (quantization, jitter). */
const LEVEL_TOLERANCE = 0.02;

function locateStep(t: number[], u: number[]): { stepTime: number; stepSize: number; stepIndex: number } {
  const before = u[0];
  const after = u[u.length - 1];
  const size = after - before;
  if (size === 0 || !Number.isFinite(size)) {
    throw new ModelError('u holds no step: its first and last values are equal.', 'invalid_request', 'u');
  }
  const index = u.findIndex((v) => Math.abs(v - before) > Math.abs(size) / 2);
  const band = LEVEL_TOLERANCE * Math.abs(size);
  for (let i = 0; i < u.length; i++) {
    const level = i < index ? before : after;
    if (Math.abs(u[i] - level) > band) {
      throw new ModelError(
        `u must hold one step from ${before} to ${after}; sample ${i} (${u[i]}) is at neither level.`,
        'invalid_request',
        `u.${i}`,
      );
    }
  }
  return { stepTime: t[index], stepSize: size, stepIndex: index };
}

/** Validates the request (ModelError naming the field) and locates the step. */
export function readStepTest(input: unknown): { test: StepTest; model: IdentifyRequest['model'] } {
  const request = parseRequest(IdentifyRequestSchema, input);
  const { t, y, u } = request;
  if (y.length !== t.length) {
    throw new ModelError(`y has ${y.length} samples but t has ${t.length}; give one y per time.`, 'invalid_request', 'y');
  }
  if (u && u.length !== t.length) {
    throw new ModelError(`u has ${u.length} samples but t has ${t.length}; give one u per time.`, 'invalid_request', 'u');
  }
  for (let i = 1; i < t.length; i++) {
    if (!(t[i] > t[i - 1])) {
      throw new ModelError(`Times must increase strictly; t[${i}] = ${t[i]} follows ${t[i - 1]}.`, 'invalid_request', `t.${i}`);
    }
  }
  const step = u
    ? locateStep(t, u)
    : { stepTime: 0, stepSize: 1, stepIndex: t.findIndex((v) => v >= 0) };
  if (step.stepIndex < 0 || t.length - step.stepIndex < 5) {
    throw new ModelError('Fewer than 5 samples follow the step; record the response for longer.', 'invalid_request', 't');
  }
  return { test: { t, y, ...step }, model: request.model };
}
