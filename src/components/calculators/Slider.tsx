import { useId } from 'react';
import { formatNumber } from '../../lib/calculators/units';

/** Slider steps across the range; fine enough that a drag feels continuous. */
const STEPS = 400;

export interface SliderProps {
  label: string;
  value: number;
  min: number;
  max: number;
  /** Logarithmic travel, for times and gains that span decades. */
  log?: boolean;
  unit?: string;
  onChange(value: number): void;
  testId?: string;
}

function toPosition(value: number, min: number, max: number, log: boolean): number {
  const clamped = Math.min(max, Math.max(min, value));
  const f = log ? Math.log(clamped / min) / Math.log(max / min) : (clamped - min) / (max - min);
  return Math.round((Number.isFinite(f) ? f : 0) * STEPS);
}

function fromPosition(position: number, min: number, max: number, log: boolean): number {
  const f = position / STEPS;
  const raw = log ? min * Math.pow(max / min, f) : min + f * (max - min);
  return Number(raw.toPrecision(4));
}

/** A range input over a parameter, linear or logarithmic, with its value read out beside it. */
export default function Slider({ label, value, min, max, log = false, unit, onChange, testId }: SliderProps) {
  const id = useId();
  const useLog = log && min > 0;
  return (
    <div className="calc-slider">
      <label htmlFor={id} className="sr-only">{label} (slider)</label>
      <input
        id={id}
        type="range"
        min={0}
        max={STEPS}
        step={1}
        value={toPosition(value, min, max, useLog)}
        data-testid={testId}
        aria-valuetext={`${formatNumber(value)}${unit ? ` ${unit}` : ''}`}
        onChange={(e) => onChange(fromPosition(Number(e.target.value), min, max, useLog))}
      />
    </div>
  );
}
