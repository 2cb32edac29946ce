import type { LoopResult } from '../../lib/calculators/loop';
import { formatWithUnit } from '../../lib/calculators/units';

function Fact({ label, value, unit, testId }: { label: string; value: number | null; unit?: string; testId?: string }) {
  return (
    <div>
      <dt>{label}</dt>
      <dd data-testid={testId}>{formatWithUnit(value, unit ?? '')}</dd>
    </div>
  );
}

/** Step information of both steps and the margins of L, beside the plots. */
export default function StepFacts({ id, result }: { id: string; result: LoopResult }) {
  const sp = result.setpoint.info;
  const ld = result.load.info;
  const m = result.margins;
  return (
    <dl className="calc-facts" data-testid={`${id}-facts`}>
      <Fact label="Rise 10–90 %" value={sp.riseTime} unit="s" testId={`${id}-rise`} />
      <Fact label="Settling 2 %" value={sp.settlingTime} unit="s" testId={`${id}-settling`} />
      <Fact label="Overshoot" value={sp.overshootPct} unit="%" testId={`${id}-overshoot`} />
      <Fact label="Peak" value={sp.peak} />
      <Fact label="Peak time" value={sp.peakTime} unit="s" />
      <Fact label="Load peak" value={ld.peak} testId={`${id}-load-peak`} />
      <Fact label="Load peak time" value={ld.peakTime} unit="s" />
      <Fact label="Load IAE" value={result.load.iae} unit="s" />
      <Fact label="Phase margin" value={m.phaseMarginDeg} unit="°" />
      <Fact label="Gain margin" value={m.gainMargin} />
      <Fact label="Ms" value={result.stable ? m.ms : null} testId={`${id}-ms`} />
    </dl>
  );
}
