import type { SensorRow } from './loop-fields';

const EMPTY: SensorRow = { num: '1', den: '', delay: '0' };

/** The measurement path H(s) = num/den · e^(−delay·s): transmitter lag, analyser delay. */
export default function SensorFields({ value, onChange, invalidField }: { value: SensorRow | null; onChange(v: SensorRow | null): void; invalidField?: string | null }) {
  const bad = (key: string) => invalidField?.startsWith(`sensor.${key}`) || undefined;
  return (
    <fieldset className="editor-fieldset" data-testid="sensor-fields">
      <legend>Sensor H(s)</legend>
      <label>
        <input type="checkbox" name="sensor.on" checked={value !== null} onChange={(e) => onChange(e.target.checked ? { ...EMPTY } : null)} /> The measurement has its own dynamics
      </label>
      {value && (
        <>
          <label>
            Numerator <input name="sensor.num" value={value.num} onChange={(e) => onChange({ ...value, num: e.target.value })} aria-invalid={bad('num')} />
          </label>
          <label>
            Denominator <input name="sensor.den" value={value.den} placeholder="e.g. 4, 1" onChange={(e) => onChange({ ...value, den: e.target.value })} aria-invalid={bad('den')} />
          </label>
          <label>
            Dead time (s) <input name="sensor.delay" inputMode="decimal" value={value.delay} onChange={(e) => onChange({ ...value, delay: e.target.value })} aria-invalid={bad('delay')} />
          </label>
          <small className="text-muted">Coefficients comma-separated, highest power of s first: 1 / (4s + 1) is numerator 1, denominator 4, 1.</small>
        </>
      )}
    </fieldset>
  );
}
