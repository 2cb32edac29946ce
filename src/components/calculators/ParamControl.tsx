import type { QuantityKind } from '../../lib/calculators/units';
import NumberField from './NumberField';
import Slider from './Slider';

export interface ParamControlProps {
  label: string;
  value: number;
  kind: QuantityKind;
  unit?: string;
  /** Slider range in the base unit. */
  range: { min: number; max: number; log?: boolean };
  /** Smallest value the field accepts (default: none). */
  min?: number;
  onChange(value: number): void;
  /** Called before a change is applied, to start the recompute timer. */
  onInput?(): void;
  testId?: string;
}

/** A parameter with both a slider (to explore) and a typed field (to enter a plant value). */
export default function ParamControl(props: ParamControlProps) {
  const { label, value, kind, unit, range, min, onChange, onInput, testId } = props;
  const change = (v: number) => {
    onInput?.();
    onChange(v);
  };
  return (
    <div className="calc-param">
      <NumberField label={label} value={value} kind={kind} unit={unit} min={min} onChange={change} testId={testId ? `${testId}-field` : undefined} />
      <Slider label={label} value={value} min={range.min} max={range.max} log={range.log} unit={unit} onChange={change} testId={testId ? `${testId}-slider` : undefined} />
    </div>
  );
}

/** A slider range around a starting value: a quarter to four times it, logarithmic. */
export function rangeAround(value: number, factor = 4): { min: number; max: number; log: boolean } {
  const base = Math.abs(value) > 0 ? Math.abs(value) : 1;
  if (value < 0) return { min: -base * factor, max: -base / factor, log: false };
  return { min: base / factor, max: base * factor, log: true };
}
