/**
 * What a calculator link carries, checked with zod's tree-shakable build (`zod/mini`). The
 * concept schemas in src/lib/schemas use zod's full build, about 29 KB gzipped in the browser,
 * more than any calculator itself; the loop response and the frequency view, which most recipe
 * pages carry, check their links with these instead. tests/lib/calculators/link-state.test.ts
 * holds both to the same verdicts on a table of inputs, so the two cannot drift apart.
 */
import * as z from 'zod/mini';

const time = z.number().check(z.gte(0));
const timeConstant = z.number().check(z.positive());
const gain = z.number().check(z.refine((k) => k !== 0, 'The process gain cannot be 0.'));
const coefficients = z.array(z.number()).check(z.minLength(1));

/** ProcessModelSchema (src/lib/schemas/process-model.ts) as a link carries it. */
export const LinkModelSchema = z.union([
  z.object({ type: z.literal('fopdt'), k: gain, tau: timeConstant, theta: time }),
  z
    .object({ type: z.literal('sopdt'), k: gain, tau1: timeConstant, tau2: timeConstant, theta: time })
    .check(z.refine((m) => m.tau1 >= m.tau2, 'tau1 must be at least tau2.')),
  z.object({ type: z.literal('ipdt'), k: gain, theta: time }),
  z.object({ type: z.literal('tf'), num: coefficients, den: coefficients, delay: z._default(time, 0) }),
]);

const idealOrSeries = {
  kc: z.number(),
  ti: z.optional(time),
  td: z.optional(time),
  n: z.optional(z.number().check(z.positive())),
};

/** PidControllerSchema (src/lib/schemas/controller.ts) as a link carries it. */
export const LinkControllerSchema = z.discriminatedUnion('form', [
  z.object({ form: z.literal('ideal'), ...idealOrSeries }),
  z.object({ form: z.literal('series'), ...idealOrSeries }),
  z.object({ form: z.literal('parallel'), kp: z.number(), ki: z.optional(z.number()), kd: z.optional(z.number()), tf: z.optional(time) }),
]);
