/**
 * Date-and-time cells: ISO 8601 (`2026-03-14T08:15:00`, with optional fraction and `Z` or
 * `±hh:mm` offset) and the common `YYYY-MM-DD hh:mm:ss` (space instead of T). A time without
 * an offset is read as UTC: only differences between rows matter, so the plant's zone cancels
 * out (a test spanning a daylight-saving change must carry offsets).
 */
const TIMESTAMP =
  /^(\d{4})-(\d{2})-(\d{2})[T ](\d{2}):(\d{2})(?::(\d{2})(?:[.,](\d{1,9}))?)?(Z|[+-]\d{2}:?\d{2})?$/i;

/** Milliseconds since 1970 (UTC), or null when the cell is not a valid date and time. */
export function parseTimestamp(cell: string): number | null {
  const m = TIMESTAMP.exec(cell.trim());
  if (!m) return null;
  const [, y, mo, d, h, mi, s = '0', frac = '', zone] = m;
  const year = Number(y);
  const month = Number(mo);
  const day = Number(d);
  const hour = Number(h);
  const minute = Number(mi);
  const second = Number(s);
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return null;
  if (hour > 23 || minute > 59 || second > 59) return null;
  const ms = frac ? Number(`0.${frac}`) * 1000 : 0;
  const local = Date.UTC(year, month - 1, day, hour, minute, second) + ms;
  return local - offsetMinutes(zone) * 60_000;
}

function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

function offsetMinutes(zone: string | undefined): number {
  if (!zone || zone.toUpperCase() === 'Z') return 0;
  const sign = zone[0] === '-' ? -1 : 1;
  const digits = zone.slice(1).replace(':', '');
  return sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2, 4)));
}
