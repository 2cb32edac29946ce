import type { PidController } from '../control/types';
import type { TuningSetting } from '../schemas/tuning-setting';

const SECONDS = { s: 1, min: 60 } as const;

/** A controller's settings in the contract's units (times in s, ki in 1/s, kd in s). */
export function toPidController(t: TuningSetting): PidController {
  const k = SECONDS[t.timeUnit];
  if (t.form === 'parallel') {
    return { form: 'parallel', kp: t.gain, ki: t.integral ? t.integral / k : 0, kd: t.derivative ? t.derivative * k : 0 };
  }
  return { form: t.form, kc: t.gain, ti: t.integral ? t.integral * k : 0, td: t.derivative ? t.derivative * k : 0 };
}

/** Settings in the given time unit from a controller in the contract's units (what the tuning rules answer). */
export function fromPidController(c: PidController, timeUnit: TuningSetting['timeUnit'], gainUnit = '%/%'): TuningSetting {
  const k = SECONDS[timeUnit];
  const orNull = (v: number | undefined) => (v ? v : null);
  if (c.form === 'parallel') {
    return { form: 'parallel', gain: c.kp, integral: c.ki ? c.ki * k : null, derivative: c.kd ? c.kd / k : null, timeUnit, gainUnit };
  }
  return { form: c.form, gain: c.kc, integral: orNull(c.ti ? c.ti / k : 0), derivative: orNull(c.td ? c.td / k : 0), timeUnit, gainUnit };
}

/** "Kc 1.8 %/%, Ti 2.5 min, Td 0 min (series)", for lists and e-mails. */
export function describeSetting(t: TuningSetting): string {
  const u = t.timeUnit;
  if (t.form === 'parallel') {
    return `Kp ${t.gain} ${t.gainUnit}, Ki ${t.integral ?? 0} 1/${u}, Kd ${t.derivative ?? 0} ${u} (parallel)`;
  }
  return `Kc ${t.gain} ${t.gainUnit}, Ti ${t.integral ?? '—'} ${t.integral ? u : ''}, Td ${t.derivative ?? 0} ${u} (${t.form})`.replace(' ,', ',');
}
