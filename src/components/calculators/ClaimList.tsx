import { METRIC_LABELS, type ClaimCheck } from '../../lib/calculators/claims';
import { formatWithUnit } from '../../lib/calculators/units';

/** The recipe's claims, each marked holding or failing for the settings as they are now. */
export default function ClaimList({ checks, testId }: { checks: ClaimCheck[]; testId?: string }) {
  if (checks.length === 0) return null;
  return (
    <ul className="calc-claims" aria-label="The recipe's claims" data-testid={testId}>
      {checks.map(({ claim, actual, holds }, i) => {
        const { label, unit } = METRIC_LABELS[claim.metric];
        const step = ['overshootPct', 'riseTime', 'settlingTime', 'peak', 'iae'].includes(claim.metric) ? ` (${claim.input} step)` : '';
        return (
          <li key={i} data-holds={holds}>
            <span className="calc-badge" data-holds={holds}>{holds ? 'HOLDS' : 'FAILS'}</span>
            <span>
              {label}{step} {claim.op === '<=' ? '≤' : '≥'} {formatWithUnit(claim.value, unit)}
              <span className="calc-note"> — now {formatWithUnit(actual, unit)}</span>
            </span>
          </li>
        );
      })}
    </ul>
  );
}
