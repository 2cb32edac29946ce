import type { Block } from '../../lib/schemas/block';
import type { QuantityKind } from '../../lib/calculators/units';
import NumberField from './NumberField';

interface Param {
  key: string;
  label: string;
  kind: QuantityKind;
  unit: string;
  min?: number;
}

/** The numbers each kind of block has, in the order they are edited. */
const PARAMS: Record<Exclude<Block['kind'], 'custom'>, Param[]> = {
  gain: [{ key: 'k', label: 'Gain k', kind: 'plain', unit: '' }],
  'first-order': [
    { key: 'k', label: 'Gain k', kind: 'plain', unit: '' },
    { key: 'tau', label: 'Time constant τ', kind: 'time', unit: 's', min: 1e-6 },
  ],
  'second-order': [
    { key: 'k', label: 'Gain k', kind: 'plain', unit: '' },
    { key: 'wn', label: 'ωn', kind: 'plain', unit: 'rad/s', min: 1e-9 },
    { key: 'zeta', label: 'Damping ζ', kind: 'plain', unit: '', min: 0 },
  ],
  'dead-time': [{ key: 'theta', label: 'Dead time θ', kind: 'time', unit: 's', min: 0 }],
  integrator: [{ key: 'k', label: 'Slope gain k', kind: 'plain', unit: '1/s' }],
  'lead-lag': [
    { key: 'k', label: 'Gain k', kind: 'plain', unit: '' },
    { key: 'tLead', label: 'Lead time', kind: 'time', unit: 's', min: 0 },
    { key: 'tLag', label: 'Lag time', kind: 'time', unit: 's', min: 1e-6 },
  ],
};

/** Parses "1, 0.5, 2" into coefficients; null when any entry is not a number. */
function coefficients(text: string): number[] | null {
  const parts = text.split(/[,\s]+/).filter(Boolean).map(Number);
  return parts.length > 0 && parts.every(Number.isFinite) ? parts : null;
}

function CoefficientField({ label, value, onChange, testId }: { label: string; value: number[]; onChange(v: number[]): void; testId?: string }) {
  return (
    <label className="calc-field">
      <span className="calc-field-label">{label}</span>
      <input
        type="text"
        defaultValue={value.join(', ')}
        data-testid={testId}
        aria-description="Coefficients separated by commas, highest power of s first"
        onBlur={(e) => {
          const parsed = coefficients(e.target.value);
          if (parsed) onChange(parsed);
          else e.target.value = value.join(', ');
        }}
      />
    </label>
  );
}

/** Typed fields for one block's numbers. */
export default function BlockEditor({ block, onChange, testId }: { block: Block; onChange(block: Block): void; testId?: string }) {
  if (block.kind === 'custom') {
    return (
      <>
        <CoefficientField key={`num:${block.num.join()}`} label="num (s)" value={block.num} onChange={(num) => onChange({ ...block, num })} testId={testId ? `${testId}-num` : undefined} />
        <CoefficientField key={`den:${block.den.join()}`} label="den (s)" value={block.den} onChange={(den) => (den.some((c) => c !== 0) ? onChange({ ...block, den }) : undefined)} testId={testId ? `${testId}-den` : undefined} />
      </>
    );
  }
  const values = block as unknown as Record<string, number>;
  return (
    <>
      {PARAMS[block.kind].map((p) => (
        <NumberField
          key={p.key}
          label={p.label}
          kind={p.kind}
          unit={p.unit}
          min={p.min}
          value={values[p.key] ?? 0}
          onChange={(v) => onChange({ ...block, [p.key]: v } as Block)}
          testId={testId ? `${testId}-${p.key}` : undefined}
        />
      ))}
    </>
  );
}
