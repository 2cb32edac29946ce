import type { FopdtSchema, IdealPidSchema, IpdtSchema } from '../schemas';
import type { z } from 'zod';
import { LOOP_TYPES } from './fields';

type LoopType = (typeof LOOP_TYPES)[number];
type StarterModel = z.infer<typeof FopdtSchema> | z.infer<typeof IpdtSchema>;
type StarterController = z.infer<typeof IdealPidSchema>;

/** A typical starting model and PI tuning per loop type (common-practice orders of magnitude, s; invented for the demo). */
export const STARTERS: Record<LoopType, { units: { pv: string; mv: string }; model: StarterModel; controller: StarterController; note: string }> = {
  flow: { units: { pv: 'm³/h', mv: '% valve' }, model: { type: "fopdt", k: 1.2, tau: 3, theta: 0.5 }, controller: { form: "ideal", kc: 0.5, ti: 3 }, note: 'Flow loops are fast and noisy: PI, no derivative, filter the measurement lightly.' },
  level: { units: { pv: '% level', mv: '% valve' }, model: { type: "ipdt", k: 0.02, theta: 5 }, controller: { form: "ideal", kc: 2, ti: 400 }, note: 'Decide first whether the tank should absorb flow changes (averaging) or hold level tightly.' },
  temperature: { units: { pv: '°C', mv: '% valve' }, model: { type: "fopdt", k: 0.8, tau: 120, theta: 20 }, controller: { form: "ideal", kc: 1.5, ti: 120, td: 10 }, note: 'Slow, with dead time from the piping and the sensor well; a cascade onto the heating medium often helps.' },
  pressure: { units: { pv: 'barg', mv: '% valve' }, model: { type: "fopdt", k: 1.5, tau: 15, theta: 2 }, controller: { form: "ideal", kc: 1, ti: 15 }, note: 'Gas pressure can be near-integrating; liquid pressure behaves like flow.' },
  speed: { units: { pv: 'rpm', mv: '% speed' }, model: { type: "fopdt", k: 1, tau: 1.5, theta: 0.1 }, controller: { form: "ideal", kc: 0.8, ti: 1.5 }, note: 'The drive usually closes its own speed loop; tune the outer loop slower than it.' },
  position: { units: { pv: '% travel', mv: '% output' }, model: { type: "fopdt", k: 1, tau: 2, theta: 0.2 }, controller: { form: "ideal", kc: 2, ti: 4 }, note: 'Check for stiction before tuning: a sticking actuator cycles whatever the tuning.' },
  ph: { units: { pv: 'pH', mv: '% dosing pump' }, model: { type: "fopdt", k: 2.5, tau: 60, theta: 15 }, controller: { form: "ideal", kc: 0.3, ti: 90 }, note: 'The titration curve makes the gain change by orders of magnitude near neutral: state the operating band.' },
  composition: { units: { pv: '% solids', mv: '% valve' }, model: { type: "fopdt", k: 1, tau: 300, theta: 60 }, controller: { form: "ideal", kc: 0.5, ti: 300 }, note: 'Analyser sample systems add dead time; include it in the model.' },
  other: { units: { pv: '% of span', mv: '% output' }, model: { type: "fopdt", k: 1, tau: 30, theta: 5 }, controller: { form: "ideal", kc: 1, ti: 30 }, note: 'Describe what the loop controls and how it responds.' },
};

/** The built-in starting body for a loop type: the sections a good recipe has, calculators placed. */
export function defaultTemplate(loopType: LoopType): { title: string; body: string } {
  const s = STARTERS[loopType];
  // JSON is also a literal MDX prop value: {{"type":"fopdt",…}}.
  const model = `{${JSON.stringify(s.model)}}`;
  const controller = `{${JSON.stringify(s.controller)}}`;
  const body = `## When to use it

Which loops this serves (tags, area) and what makes them alike. ${s.note}

## The process and its model

Where the numbers came from: a step test on the plant (date, size of the step, conditions),
design data or a vendor sheet. Write the model, e.g. $G(s) = \\dfrac{K e^{-\\theta s}}{\\tau s + 1}$.

<LoopResponse model=${model} controller=${controller} title="Closed-loop response" />

## Structure and tuning

The controller structure and form, the rule the tuning came from, and what was changed after.

<FrequencyView model=${model} controller=${controller} title="Margins of the loop" />

## Commissioning steps

1. Put the loop in manual and check the valve or drive moves the right way.
2. Enter the tuning, switch to automatic at a steady operating point, and make a small setpoint step.
3. Compare the response with the plot above; note what differed.

> Test in manual first. Respect interlocks and the safety system. Food-safety hold
> temperatures are legal limits, not tuning targets. Site procedures come first.

## Pitfalls

What goes wrong on this kind of loop and how to tell.

## Field notes

What people found when they used it (readers add theirs with a rating).
`;
  return { title: `${loopType[0].toUpperCase()}${loopType.slice(1)} loop recipe`, body };
}
