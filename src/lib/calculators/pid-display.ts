/**
 * A PID's settings in the form and units a colleague asks for: ideal, series or parallel;
 * gain as a ratio or a proportional band; integral as time in s or min, or repeats per minute;
 * derivative in s or min. Conversions are the engine's (pid-forms.ts, pid-units.ts).
 */
import { toIdeal, toParallel, toSeries } from '../control/pid-forms';
import type { PidController } from '../control/types';
import { formatNumber } from './units';

export type PidForm = PidController['form'];

/** The units settings are shown in. */
export interface PidUnits {
  gain: 'ratio' | 'pb';
  integral: 's' | 'min' | 'rpm';
  derivative: 's' | 'min';
}

export const DEFAULT_UNITS: PidUnits = { gain: 'ratio', integral: 's', derivative: 's' };

/** One shown setting: its symbol, its value in the chosen unit (null = off/none) and the unit. */
export interface SettingRow {
  key: string;
  label: string;
  value: number | null;
  unit: string;
}

/** The controller in another form; null when that form has no equivalent (e.g. series with complex zeros). */
export function convertForm(c: PidController, form: PidForm): PidController | null {
  if (form === 'ideal') return toIdeal(c);
  if (form === 'series') return toSeries(c);
  return toParallel(c);
}

function gainRow(kc: number, units: PidUnits, symbol = 'Kc'): SettingRow {
  if (units.gain === 'pb') return { key: 'pb', label: 'PB', value: kc !== 0 ? 100 / kc : null, unit: '%' };
  return { key: 'kc', label: symbol, value: kc, unit: '' };
}

function integralRow(ti: number, units: PidUnits): SettingRow {
  if (!(ti > 0)) return { key: 'ti', label: units.integral === 'rpm' ? 'Integral rate' : 'Ti', value: null, unit: 'off' };
  if (units.integral === 'rpm') return { key: 'ri', label: 'Integral rate', value: 60 / ti, unit: 'repeats/min' };
  return { key: 'ti', label: 'Ti', value: units.integral === 'min' ? ti / 60 : ti, unit: units.integral };
}

function derivativeRow(td: number, units: PidUnits): SettingRow {
  return { key: 'td', label: 'Td', value: units.derivative === 'min' ? td / 60 : td, unit: units.derivative };
}

/** The settings of a controller as rows in the chosen units (the form is the controller's own). */
export function settingRows(c: PidController, units: PidUnits): SettingRow[] {
  if (c.form === 'parallel') {
    const rows: SettingRow[] = [gainRow(c.kp, units, 'Kp')];
    const perMinute = units.integral !== 's';
    rows.push({ key: 'ki', label: 'Ki', value: (c.ki ?? 0) * (perMinute ? 60 : 1), unit: perMinute ? '1/min' : '1/s' });
    rows.push({ key: 'kd', label: 'Kd', value: units.derivative === 'min' ? (c.kd ?? 0) / 60 : c.kd ?? 0, unit: units.derivative });
    rows.push({ key: 'tf', label: 'Tf', value: c.tf ?? 0, unit: 's' });
    return rows;
  }
  return [gainRow(c.kc, units), integralRow(c.ti ?? 0, units), derivativeRow(c.td ?? 0, units), { key: 'n', label: 'N', value: c.n ?? 10, unit: '' }];
}

/** The settings as one line of text, e.g. "series: Kc = 1.6, Ti = 46 s, Td = 0 s, N = 10". */
export function settingsText(c: PidController, units: PidUnits): string {
  const parts = settingRows(c, units).map((r) => `${r.label} = ${r.value === null ? 'off' : formatNumber(r.value)}${r.unit && r.value !== null ? ` ${r.unit}` : ''}`);
  return `${c.form}: ${parts.join(', ')}`;
}
