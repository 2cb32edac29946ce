/** Form fields for a process model (fopdt, sopdt, ipdt); times in s. */
export type ModelValue =
  | { type: 'fopdt'; k: number; tau: number; theta: number }
  | { type: 'sopdt'; k: number; tau1: number; tau2: number; theta: number }
  | { type: 'ipdt'; k: number; theta: number };

const PARAMS: Record<ModelValue['type'], { key: string; label: string }[]> = {
  fopdt: [{ key: 'k', label: 'Gain K' }, { key: 'tau', label: 'Time constant τ (s)' }, { key: 'theta', label: 'Dead time θ (s)' }],
  sopdt: [{ key: 'k', label: 'Gain K' }, { key: 'tau1', label: 'τ1 (s)' }, { key: 'tau2', label: 'τ2 (s)' }, { key: 'theta', label: 'Dead time θ (s)' }],
  ipdt: [{ key: 'k', label: 'Slope gain K (1/s)' }, { key: 'theta', label: 'Dead time θ (s)' }],
};

const DEFAULTS: Record<ModelValue['type'], ModelValue> = {
  fopdt: { type: 'fopdt', k: 1, tau: 30, theta: 5 },
  sopdt: { type: 'sopdt', k: 1, tau1: 30, tau2: 5, theta: 2 },
  ipdt: { type: 'ipdt', k: 0.02, theta: 5 },
};

export default function ModelFields({ value, onChange }: { value: ModelValue | null; onChange(v: ModelValue | null): void }) {
  return (
    <fieldset className="editor-fieldset" data-testid="model-fields">
      <legend>Process model</legend>
      <label>
        Type{' '}
        <select value={value?.type ?? ''} onChange={(e) => onChange(e.target.value ? { ...DEFAULTS[e.target.value as ModelValue['type']] } : null)}>
          <option value="">none yet</option>
          <option value="fopdt">First order + dead time</option>
          <option value="sopdt">Second order + dead time</option>
          <option value="ipdt">Integrating + dead time</option>
        </select>
      </label>
      {value &&
        PARAMS[value.type].map((p) => (
          <label key={p.key}>
            {p.label}{' '}
            <input
              type="number"
              step="any"
              value={String((value as Record<string, unknown>)[p.key] ?? '')}
              onChange={(e) => onChange({ ...value, [p.key]: e.target.value === '' ? Number.NaN : Number(e.target.value) } as ModelValue)}
            />
          </label>
        ))}
    </fieldset>
  );
}
