/** The first body of a draft recipe started from a step test: where the numbers came from, in plain Markdown. */
import type { ProcessModel } from '../control/types';
import type { EvidenceTuning } from '../schemas/evidence';
import { describeSetting } from './tuning-setting';

const n = (x: number) => String(Number(x.toPrecision(4)));

/** The model in words, with units (times in s). */
export function describeModel(m: ProcessModel): string {
  if (m.type === 'fopdt') return `first order plus dead time: K = ${n(m.k)}, τ = ${n(m.tau)} s, θ = ${n(m.theta)} s`;
  if (m.type === 'sopdt') return `second order plus dead time: K = ${n(m.k)}, τ1 = ${n(m.tau1)} s, τ2 = ${n(m.tau2)} s, θ = ${n(m.theta)} s`;
  return `integrator plus dead time: K = ${n(m.k)} per s, θ = ${n(m.theta)} s`;
}

export function draftBody(input: { tag: string; testedAt: string; by: string; model: ProcessModel; fit: { rmse: number; r2: number }; tuning: EvidenceTuning; note: string }): string {
  const rule = input.tuning.rule ? `the ${input.tuning.rule} rule` : 'hand tuning';
  return [
    '## Where the numbers come from',
    '',
    `A step test of ${input.tag} uploaded on ${input.testedAt.slice(0, 10)} by ${input.by}. The model fitted to it is ${describeModel(input.model)} (RMSE ${n(input.fit.rmse)}, R² ${n(input.fit.r2)}).`,
    '',
    '## Tuning',
    '',
    `From ${rule}: ${describeSetting(input.tuning.setting)}.`,
    ...(input.note ? ['', input.note.replace(/[{}<>]/g, '')] : []),
    '',
    '## Before you use it',
    '',
    'Test in manual first, keep interlocks and the safety system in service, and treat pasteurizer hold temperatures as legal limits. Follow site procedures.',
    '',
  ].join('\n');
}
