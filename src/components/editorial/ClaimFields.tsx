import { CLAIM_METRICS, NEW_CLAIM, type ClaimRow } from './loop-fields';

/** What each metric means, and its unit, for the metric select. */
const METRIC_LABELS: Record<ClaimRow['metric'], string> = {
  overshootPct: 'Overshoot (%)',
  riseTime: 'Rise time 10–90 % (s)',
  settlingTime: 'Settling time, 2 % band (s)',
  peak: 'Peak |y| (PV units per unit step)',
  iae: 'IAE, unit step',
  phaseMarginDeg: 'Phase margin (°)',
  gainMargin: 'Gain margin (ratio)',
  delayMargin: 'Delay margin (s)',
  ms: 'Peak sensitivity Ms',
  mt: 'Complementary peak Mt',
};

/** The recipe's performance claims as an editable list: one row per claim, add and remove. */
export default function ClaimFields({ rows, onChange, invalidField }: { rows: ClaimRow[]; onChange(rows: ClaimRow[]): void; invalidField?: string | null }) {
  const set = (i: number, patch: Partial<ClaimRow>) => onChange(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  return (
    <fieldset className="editor-fieldset editor-claims" data-testid="claim-fields">
      <legend>Performance claims</legend>
      {rows.length === 0 && <p className="text-sm text-muted">No claims yet. A claim is a bound the loop meets, e.g. overshoot ≤ 5 % on a setpoint step.</p>}
      {rows.map((r, i) => (
        <div className="editor-claim" key={i} data-testid="claim-row">
          <select aria-label={`Claim ${i + 1} metric`} name={`claims.${i}.metric`} value={r.metric} onChange={(e) => set(i, { metric: e.target.value as ClaimRow['metric'] })}>
            {CLAIM_METRICS.map((m) => <option key={m} value={m}>{METRIC_LABELS[m]}</option>)}
          </select>
          <select aria-label={`Claim ${i + 1} bound`} name={`claims.${i}.op`} value={r.op} onChange={(e) => set(i, { op: e.target.value as ClaimRow['op'] })}>
            <option value="<=">at most (≤)</option>
            <option value=">=">at least (≥)</option>
          </select>
          <input aria-label={`Claim ${i + 1} value`} name={`claims.${i}.value`} inputMode="decimal" value={r.value} onChange={(e) => set(i, { value: e.target.value })} aria-invalid={invalidField?.startsWith(`claims.${i}`) || undefined} />
          <select aria-label={`Claim ${i + 1} step`} name={`claims.${i}.input`} value={r.input} onChange={(e) => set(i, { input: e.target.value as ClaimRow['input'] })}>
            <option value="setpoint">setpoint step</option>
            <option value="load">load step</option>
          </select>
          <button type="button" onClick={() => onChange(rows.filter((_, j) => j !== i))} aria-label={`Remove claim ${i + 1}`}>Remove</button>
        </div>
      ))}
      <button type="button" onClick={() => onChange([...rows, { ...NEW_CLAIM }])} data-testid="add-claim">Add a claim</button>
    </fieldset>
  );
}
