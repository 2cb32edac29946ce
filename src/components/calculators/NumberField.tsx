import { useEffect, useId, useState } from 'react';
import { formatNumber, parseQuantity, type QuantityKind } from '../../lib/calculators/units';

export interface NumberFieldProps {
  label: string;
  /** In the base unit: s for times, plain ratio for gains. */
  value: number;
  kind: QuantityKind;
  /** The unit shown after the value (the base unit), e.g. "s". */
  unit?: string;
  /** Smallest accepted value in the base unit (inclusive); a clear message below it. */
  min?: number;
  onChange(value: number): void;
  testId?: string;
}

/**
 * A typed number that understands the trade's units ("2 min", "PB 150", "0.5 repeats/min").
 * The value is applied on Enter or when the field loses focus; a typing mistake shows what
 * the field expects and keeps the last good value.
 */
export default function NumberField({ label, value, kind, unit, min, onChange, testId }: NumberFieldProps) {
  const id = useId();
  const [text, setText] = useState(formatNumber(value));
  const [focused, setFocused] = useState(false);
  const [error, setError] = useState<string | null>(null);

  useEffect(() => {
    if (!focused) setText(formatNumber(value));
  }, [value, focused]);

  function apply() {
    const parsed = parseQuantity(text, kind);
    if (!parsed.ok) return setError(parsed.message);
    if (min !== undefined && parsed.value < min) {
      return setError(`${label} must be at least ${formatNumber(min)}${unit ? ` ${unit}` : ''}.`);
    }
    setError(null);
    setText(formatNumber(parsed.value));
    if (parsed.value !== value) onChange(parsed.value);
  }

  return (
    <div className="calc-field">
      <label htmlFor={id} className="calc-field-label">{label}</label>
      <span className="calc-field-input">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          spellCheck={false}
          autoComplete="off"
          value={text}
          data-testid={testId}
          aria-invalid={error !== null}
          aria-describedby={error ? `${id}-error` : undefined}
          onChange={(e) => setText(e.target.value)}
          onFocus={() => setFocused(true)}
          onBlur={() => {
            setFocused(false);
            apply();
          }}
          onKeyDown={(e) => {
            if (e.key === 'Enter') apply();
            if (e.key === 'Escape') {
              setText(formatNumber(value));
              setError(null);
            }
          }}
        />
        <span className="calc-unit" aria-hidden={unit ? undefined : true}>{unit ?? ""}</span>
      </span>
      {error ? <span id={`${id}-error`} role="alert" className="calc-error">{error}</span> : null}
    </div>
  );
}
