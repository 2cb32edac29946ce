/**
 * PID controllers as transfer functions (contract forms; times in s):
 * ideal    C = kc·(1 + 1/(ti·s) + td·s/(1 + (td/n)·s))
 * series   C = kc·(1 + 1/(ti·s))·(1 + td·s)/(1 + (td/n)·s)
 * parallel C = kp + ki/s + kd·s/(1 + tf·s)
 * ti (ki) absent or 0: no integral action; td (kd) absent or 0: no derivative.
 */
import { ModelError, type PidController, type TransferFunction } from './types';
import { multiply, trim } from './polynomial';

function finite(value: unknown, field: string, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ModelError(`${what} must be a finite number.`, 'invalid_request', field);
  }
  return value;
}

function nonNegative(value: unknown, field: string, what: string): number {
  if (value === undefined || value === null) return 0;
  const v = finite(value, field, what);
  if (v < 0) throw new ModelError(`${what} must be zero or more (0 switches it off).`, 'invalid_request', field);
  return v;
}

function filterDivisor(value: unknown, field: string): number {
  if (value === undefined || value === null) return 10;
  const v = finite(value, field, 'The derivative filter divisor n');
  if (v <= 0) throw new ModelError('The derivative filter divisor n must be above zero (10 is usual).', 'invalid_request', field);
  return v;
}

/** C(s) of a PID in any contract form; prefix is the request path of the controller. */
export function pidToTransferFunction(c: PidController, prefix = 'controller'): TransferFunction {
  const at = (k: string) => (prefix ? `${prefix}.${k}` : k);
  if (c.form === 'parallel') {
    const kp = finite(c.kp, at('kp'), 'The proportional gain kp');
    const ki = finite(c.ki ?? 0, at('ki'), 'The integral gain ki');
    const kd = finite(c.kd ?? 0, at('kd'), 'The derivative gain kd');
    const tf = nonNegative(c.tf, at('tf'), 'The derivative filter time tf');
    const num = [kp * tf + kd, kp + ki * tf, ki];
    const den = ki !== 0 ? [tf, 1, 0] : [tf, 1];
    return { num: trim(ki !== 0 ? num : [kp * tf + kd, kp]), den: trim(den), delay: 0 };
  }
  if (c.form !== 'ideal' && c.form !== 'series') {
    throw new ModelError('The controller form must be ideal, series or parallel.', 'invalid_request', at('form'));
  }
  const kc = finite(c.kc, at('kc'), 'The controller gain kc');
  const ti = nonNegative(c.ti, at('ti'), 'The integral time ti');
  const td = nonNegative(c.td, at('td'), 'The derivative time td');
  const a = td / filterDivisor(c.n, at('n'));
  const integral = ti > 0 ? { num: [ti, 1], den: [ti, 0] } : { num: [1], den: [1] };
  if (c.form === 'series') {
    const deriv = td > 0 ? { num: [td, 1], den: [a, 1] } : { num: [1], den: [1] };
    return { num: trim(multiply([kc], multiply(integral.num, deriv.num))), den: trim(multiply(integral.den, deriv.den)), delay: 0 };
  }
  if (td === 0) return { num: trim(multiply([kc], integral.num)), den: integral.den, delay: 0 };
  if (ti === 0) return { num: trim([kc * (a + td), kc]), den: [a, 1], delay: 0 };
  return { num: trim([kc * ti * (a + td), kc * (ti + a), kc]), den: [ti * a, ti, 0], delay: 0 };
}
