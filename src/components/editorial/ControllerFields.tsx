/** Form fields for a PID in the ideal or series form; times in s (ti/td empty = no I/D action). */
export interface ControllerValue {
  form: 'ideal' | 'series';
  kc: number;
  ti?: number;
  td?: number;
}

function num(v: string): number | undefined {
  return v === '' ? undefined : Number(v);
}

export default function ControllerFields({ value, onChange }: { value: ControllerValue | null; onChange(v: ControllerValue | null): void }) {
  return (
    <fieldset className="editor-fieldset" data-testid="controller-fields">
      <legend>Controller</legend>
      <label>
        Form{' '}
        <select value={value?.form ?? ''} onChange={(e) => onChange(e.target.value ? { kc: 1, ti: 30, ...value, form: e.target.value as ControllerValue['form'] } : null)}>
          <option value="">none yet</option>
          <option value="ideal">Ideal (ISA)</option>
          <option value="series">Series (interacting)</option>
        </select>
      </label>
      {value && (
        <>
          <label>
            Gain kc <input type="number" step="any" value={String(value.kc)} onChange={(e) => onChange({ ...value, kc: Number(e.target.value) })} />
          </label>
          <label>
            Integral time ti (s) <input type="number" step="any" value={value.ti ?? ''} onChange={(e) => onChange({ ...value, ti: num(e.target.value) })} />
          </label>
          <label>
            Derivative time td (s) <input type="number" step="any" value={value.td ?? ''} onChange={(e) => onChange({ ...value, td: num(e.target.value) })} />
          </label>
        </>
      )}
    </fieldset>
  );
}
