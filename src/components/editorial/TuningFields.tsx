import { TUNING_RULE_IDS, type TuningRow } from './loop-fields';

const RULE_LABELS: Record<(typeof TUNING_RULE_IDS)[number], string> = {
  simc: 'SIMC', lambda: 'Lambda', imc: 'IMC-PID', 'zn-open-loop': 'Ziegler–Nichols reaction curve',
  'zn-ultimate': 'Ziegler–Nichols ultimate gain', 'cohen-coon': 'Cohen–Coon', amigo: 'AMIGO', field: 'Tuned by hand in the field',
};

/** How the controller's numbers were found: the rule, its design time (s), and what was changed afterwards. */
export default function TuningFields({ value, onChange, invalidField }: { value: TuningRow; onChange(v: TuningRow): void; invalidField?: string | null }) {
  return (
    <fieldset className="editor-fieldset" data-testid="tuning-fields">
      <legend>Tuning rule</legend>
      <label>
        Rule{' '}
        <select name="tuningRule.rule" value={value.rule} onChange={(e) => onChange({ ...value, rule: e.target.value as TuningRow['rule'] })}>
          <option value="">not stated yet</option>
          {TUNING_RULE_IDS.map((r) => <option key={r} value={r}>{RULE_LABELS[r]}</option>)}
        </select>
      </label>
      {value.rule && (
        <>
          <label>
            Design time τc / λ (s){' '}
            <input name="tuningRule.designTime" inputMode="decimal" value={value.designTime} onChange={(e) => onChange({ ...value, designTime: e.target.value })} aria-invalid={invalidField === 'tuningRule.designTime' || undefined} />
          </label>
          <label className="editor-wide">
            Note{' '}
            <input name="tuningRule.note" value={value.note} placeholder="e.g. ti rounded to 30 s" onChange={(e) => onChange({ ...value, note: e.target.value })} />
          </label>
        </>
      )}
    </fieldset>
  );
}
