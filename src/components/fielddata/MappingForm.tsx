import type { ColumnMapping } from './types';

export interface MappingFormProps {
  columns: number;
  header: string[] | null;
  mapping: ColumnMapping;
  onChange(mapping: ColumnMapping): void;
}

const TIME_UNITS = [
  ['s', 'seconds'], ['ms', 'milliseconds'], ['min', 'minutes'], ['h', 'hours'], ['timestamp', 'date and time'],
] as const;

/** Which column is time, process value and controller output, and their units. */
export default function MappingForm({ columns, header, mapping, onChange }: MappingFormProps) {
  const options = Array.from({ length: columns }, (_, i) => (
    <option key={i} value={i + 1}>{`column ${i + 1}${header?.[i] ? ` · ${header[i]}` : ''}`}</option>
  ));
  const select = 'rounded border border-rule bg-paper px-2 py-1';
  const unit = 'w-20 rounded border border-rule bg-paper px-2 py-1 font-mono';
  return (
    <fieldset className="mt-3 grid gap-2 text-sm sm:grid-cols-3" data-testid="fd-mapping">
      <legend className="mb-1 text-xs uppercase tracking-widest text-copper">Columns and units</legend>
      <label className="flex flex-col gap-1">
        Time
        <span className="flex gap-2">
          <select className={select} value={mapping.time.column} onChange={(e) => onChange({ ...mapping, time: { ...mapping.time, column: Number(e.target.value) } })} data-testid="fd-map-time">{options}</select>
          <select className={select} value={mapping.time.unit} onChange={(e) => onChange({ ...mapping, time: { ...mapping.time, unit: e.target.value as ColumnMapping['time']['unit'] } })} aria-label="Time unit">
            {TIME_UNITS.map(([v, l]) => <option key={v} value={v}>{l}</option>)}
          </select>
        </span>
      </label>
      <label className="flex flex-col gap-1">
        Process value
        <span className="flex gap-2">
          <select className={select} value={mapping.pv.column} onChange={(e) => onChange({ ...mapping, pv: { ...mapping.pv, column: Number(e.target.value) } })} data-testid="fd-map-pv">{options}</select>
          <input className={unit} value={mapping.pv.unit} onChange={(e) => onChange({ ...mapping, pv: { ...mapping.pv, unit: e.target.value } })} aria-label="Process-value unit" placeholder="°C" />
        </span>
      </label>
      <label className="flex flex-col gap-1">
        Controller output
        <span className="flex gap-2">
          <select className={select} value={mapping.co?.column ?? 0} data-testid="fd-map-co"
            onChange={(e) => onChange({ ...mapping, co: Number(e.target.value) ? { column: Number(e.target.value), unit: mapping.co?.unit ?? '%' } : null })}>
            <option value={0}>none (unit step at t = 0)</option>
            {options}
          </select>
          {mapping.co && <input className={unit} value={mapping.co.unit} onChange={(e) => onChange({ ...mapping, co: { ...mapping.co!, unit: e.target.value } })} aria-label="Output unit" />}
        </span>
      </label>
    </fieldset>
  );
}
