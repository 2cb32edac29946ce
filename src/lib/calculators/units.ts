/**
 * Numbers as engineers type them into a calculator field: "120", "2 min", "120 s", "0.5 rpm",
 * "150 %PB", "PB 150". Every result is in the engine's base unit: seconds for times, a plain
 * ratio for gains. Pure (no DOM), so the same parser serves islands and tests.
 */

/** What a field holds, which decides the units it accepts. */
export type QuantityKind =
  /** A time (time constant, dead time, derivative time): s by default; ms, s, min, h. */
  | 'time'
  /** An integral setting: a time as above, or a rate in repeats per minute ("0.5 rpm", "0.5 /min"). */
  | 'integral'
  /** A controller gain: a plain ratio, or a proportional band in % ("150 %", "150 %PB", "PB 150"). */
  | 'gain'
  /** A bare number with no unit (a process gain, a ratio, a count). */
  | 'plain';

export type ParsedQuantity =
  | { ok: true; /** In the base unit (s, or plain ratio). */ value: number; /** The unit that was recognised. */ unit: string }
  | { ok: false; /** One sentence the user can act on. */ message: string };

const NUMBER = String.raw`[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[-+]?\d+)?`;

/** Seconds per unit of time, by the spellings the trade uses. */
const TIME_UNITS: Record<string, { unit: string; seconds: number }> = {
  ms: { unit: 'ms', seconds: 0.001 },
  s: { unit: 's', seconds: 1 },
  sec: { unit: 's', seconds: 1 },
  secs: { unit: 's', seconds: 1 },
  second: { unit: 's', seconds: 1 },
  seconds: { unit: 's', seconds: 1 },
  m: { unit: 'min', seconds: 60 },
  min: { unit: 'min', seconds: 60 },
  mins: { unit: 'min', seconds: 60 },
  minute: { unit: 'min', seconds: 60 },
  minutes: { unit: 'min', seconds: 60 },
  h: { unit: 'h', seconds: 3600 },
  hr: { unit: 'h', seconds: 3600 },
  hour: { unit: 'h', seconds: 3600 },
  hours: { unit: 'h', seconds: 3600 },
};

/** Spellings of "repeats per minute" (the integral rate 60/ti, ti in s). */
const RATE_UNITS = new Set(['rpm', 'r/min', 'rep/min', 'repeats/min', 'repeat/min', 'repeats per minute', '/min', '1/min']);

const EXPECTED: Record<QuantityKind, string> = {
  time: 'a time such as "45", "45 s" or "2 min"',
  integral: 'an integral time such as "90 s" or "1.5 min", or a rate such as "0.67 repeats/min"',
  gain: 'a gain such as "1.8", or a proportional band such as "150 %" or "PB 150"',
  plain: 'a number such as "2.5" or "-0.8"',
};

function fail(kind: QuantityKind, text: string): ParsedQuantity {
  const shown = text.trim() === '' ? 'An empty field' : `"${text.trim()}"`;
  return { ok: false, message: `${shown} is not ${EXPECTED[kind]}.` };
}

/** Splits "150 %PB" or "PB 150" into the number and the unit words around it. */
function split(text: string): { number: number; unit: string } | null {
  const normal = text.trim().toLowerCase().replace(/\s+/g, ' ').replace(/\u2212/g, '-');
  const match = new RegExp(`^(.*?)(${NUMBER})(.*)$`).exec(normal);
  if (!match) return null;
  const before = match[1]!.trim();
  const after = match[3]!.trim();
  const number = Number(match[2]);
  if (!Number.isFinite(number)) return null;
  // Only the proportional band is written with its unit in front ("PB 150").
  if (before !== '' && before !== 'pb') return null;
  const unit = before === 'pb' ? `pb ${after}`.trim() : after;
  return { number, unit };
}

/** Parses a typed quantity of the given kind into its base unit, or says what was expected. */
export function parseQuantity(text: string, kind: QuantityKind): ParsedQuantity {
  const parts = split(text);
  if (!parts) return fail(kind, text);
  const { number, unit } = parts;
  if (kind === 'plain') return unit === '' ? { ok: true, value: number, unit: '' } : fail(kind, text);
  if (kind === 'gain') return parseGain(number, unit, text);
  const time = TIME_UNITS[unit === '' ? 's' : unit];
  if (time) return { ok: true, value: number * time.seconds, unit: time.unit };
  if (kind === 'integral' && RATE_UNITS.has(unit)) {
    if (number <= 0) return { ok: false, message: 'A rate in repeats per minute must be above zero (use 0 s to switch integral action off).' };
    return { ok: true, value: 60 / number, unit: 'repeats/min' };
  }
  return fail(kind, text);
}

function parseGain(number: number, unit: string, text: string): ParsedQuantity {
  if (unit === '') return { ok: true, value: number, unit: '' };
  const band = unit.replace(/\s/g, '');
  if (['%', '%pb', 'pb', 'pb%', '%band'].includes(band)) {
    if (number === 0) return { ok: false, message: 'A proportional band of 0 % is an infinite gain; give a band above zero.' };
    return { ok: true, value: 100 / number, unit: '%PB' };
  }
  return fail('gain', text);
}

/** How many significant digits numbers are shown with in fields and tables. */
export const DISPLAY_DIGITS = 4;

/** A number for display: 4 significant digits, no exponent for everyday magnitudes, "—" for none. */
export function formatNumber(value: number | null | undefined, digits = DISPLAY_DIGITS): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  if (magnitude >= 1e6 || magnitude < 1e-4) return value.toExponential(digits - 1);
  return String(Number(value.toPrecision(digits)));
}

/** A number with its unit as SI writes it ("12 s", "4.2 %", but "63.3°"); "—" for none. */
export function formatWithUnit(value: number | null | undefined, unit: string): string {
  const text = formatNumber(value);
  if (text === '—' || unit === '') return text;
  return unit === '°' ? `${text}°` : `${text} ${unit}`;
}
