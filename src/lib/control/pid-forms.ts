/**
 * Exact conversions between the PID forms of pid.ts, derivative filter included (the filter
 * time constant td/n or tf is kept). A conversion that has no equivalent answers null.
 */
import type { IdealPid, ParallelPid, PidController, SeriesPid } from './types';

interface Normal { kc: number; ti: number; td: number; n: number }

function normal(c: IdealPid | SeriesPid): Normal {
  return { kc: c.kc, ti: c.ti ?? 0, td: c.td ?? 0, n: c.n ?? 10 };
}

/** The same controller in ideal form; null when none exists. */
export function toIdeal(c: PidController): IdealPid | null {
  if (c.form === 'ideal') return { ...c };
  if (c.form === 'parallel') {
    const ki = c.ki ?? 0, kd = c.kd ?? 0, tf = c.tf ?? 0;
    if (c.kp === 0) return null;
    const ti = ki !== 0 ? c.kp / ki : 0;
    const td = kd / c.kp;
    if (ti < 0 || td < 0 || (td > 0 && tf === 0)) return null;
    return { form: 'ideal', kc: c.kp, ti, td, n: td > 0 ? td / tf : 10 };
  }
  const { kc, ti, td, n } = normal(c);
  const a = td / n;
  if (td === 0) return { form: 'ideal', kc, ti, td: 0, n };
  if (ti === 0) {
    const tdi = td - a;
    return tdi > 0 ? { form: 'ideal', kc, ti: 0, td: tdi, n: tdi / a } : null;
  }
  // Match kc'/ti' = kc/ti, ti' + a = ti + td, ti'·(a + td') = ti·td.
  const tiI = ti + td - a;
  const tdI = (ti * td) / tiI - a;
  if (tiI <= 0 || tdI <= 0) return null;
  return { form: 'ideal', kc: (kc * tiI) / ti, ti: tiI, td: tdI, n: tdI / a };
}

/** The same controller in parallel form (always exists from ideal or series). */
export function toParallel(c: PidController): ParallelPid | null {
  if (c.form === 'parallel') return { ...c };
  const ideal = toIdeal(c);
  if (!ideal) return null;
  const { kc, ti, td, n } = normal(ideal);
  return { form: 'parallel', kp: kc, ki: ti > 0 ? kc / ti : 0, kd: kc * td, tf: td > 0 ? td / n : 0 };
}

/** The same controller in series form; null when its zeros are complex (ti < 4·td roughly). */
export function toSeries(c: PidController): SeriesPid | null {
  if (c.form === 'series') return { ...c };
  const ideal = toIdeal(c);
  if (!ideal) return null;
  const { kc, ti, td, n } = normal(ideal);
  const a = td / n;
  if (td === 0) return { form: 'series', kc, ti, td: 0, n };
  if (ti === 0) return { form: 'series', kc, ti: 0, td: td + a, n: (td + a) / a };
  // ti_s + td_s = ti + a and ti_s·td_s = ti·(td + a): the roots of x² − (ti + a)x + ti(td + a).
  const sum = ti + a;
  const prod = ti * (td + a);
  const disc = sum * sum - 4 * prod;
  if (disc < 0) return null;
  const tiS = (sum + Math.sqrt(disc)) / 2;
  const tdS = prod / tiS;
  return { form: 'series', kc: (kc * tiS) / ti, ti: tiS, td: tdS, n: tdS / a };
}
