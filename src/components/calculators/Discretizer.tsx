import { useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import { z } from 'zod';
import { analyze } from '../../lib/control/analyze';
import { discretize } from '../../lib/control/discretize';
import { discretePid } from '../../lib/control/discrete-pid';
import type { PidControllerInput } from '../../lib/schemas/controller';
import type { TransferFunctionInput } from '../../lib/schemas/transfer-function';
import { differenceEquationText, discreteStep } from '../../lib/calculators/difference-equation';
import { formatNumber } from '../../lib/calculators/units';
import Chart from './Chart';
import ExportBar from './ExportBar';
import NumberField from './NumberField';
import { describeError } from './describe-error';
import { useCalcUpdate } from './useCalcUpdate';
import { useUrlState } from './useUrlState';
import './calculators.css';

export interface DiscretizerProps {
  /** The continuous transfer function (s), dead time included. */
  tf: TransferFunctionInput;
  /** Sample time to start from, s. */
  ts: number;
  /** A PID to print as the difference equation a PLC runs. */
  controller?: PidControllerInput;
  /** Names this calculator's URL parameter; give one per instance when a page has several. */
  id?: string;
  title?: string;
}

const StateSchema = z.object({
  ts: z.number().positive(),
  method: z.enum(['zoh', 'tustin']),
  pidMethod: z.enum(['backward-euler', 'tustin']),
  pidForm: z.enum(['positional', 'velocity']),
});
type State = z.infer<typeof StateSchema>;

/** The step chart shows the response settle, in this many samples at most (and at least the fewer). */
const MAX_SAMPLES = 400;
const MIN_SAMPLES = 20;

function coefficientList(values: readonly number[]): string {
  return values.map((v) => formatNumber(v, 6)).join(', ');
}

/** Prints G(z), its difference equation and the discrete PID for a chosen sample time. */
export default function Discretizer({ tf, ts, controller, id = 'discretizer', title = 'Discretizer' }: DiscretizerProps) {
  const initial: State = { ts, method: 'zoh', pidMethod: 'backward-euler', pidForm: 'positional' };
  const { state, update } = useUrlState(id, StateSchema, initial);
  const chartRef = useRef<uPlot | null>(null);

  const result = useMemo(() => {
    try {
      const g = discretize({ tf, ts: state.ts, method: state.method });
      const settles = analyze({ plant: tf, analyses: { step: { points: 101 } } }).step!.tFinal;
      const samples = Math.min(MAX_SAMPLES, Math.max(MIN_SAMPLES, Math.ceil(settles / state.ts) + 1));
      const step = discreteStep(g, samples);
      const t = step.map((_, k) => k * state.ts);
      // The continuous response at the same instants: a zero-order hold matches it exactly there.
      const continuous = analyze({ plant: tf, analyses: { step: { tFinal: t[t.length - 1]!, points: samples } } }).step!.y;
      return { ok: true as const, g, step, t, continuous };
    } catch (error) {
      return { ok: false as const, message: describeError(error) };
    }
  }, [tf, state.ts, state.method]);

  const pid = useMemo(() => {
    if (!controller) return null;
    try {
      return { ok: true as const, value: discretePid(controller, state.ts, { method: state.pidMethod, form: state.pidForm }) };
    } catch (error) {
      return { ok: false as const, message: describeError(error) };
    }
  }, [controller, state.ts, state.pidMethod, state.pidForm]);

  const begin = useCalcUpdate([result, pid]);
  const set = (change: Partial<State>) => {
    begin();
    update(change);
  };

  const data = useMemo<uPlot.AlignedData>(() => (result.ok ? [result.t, result.continuous, result.step] : [[], [], []]), [result]);
  const text = () => {
    const lines = [`Sample time ts = ${state.ts} s, ${state.method === 'zoh' ? 'zero-order hold' : 'Tustin'}`];
    if (result.ok) {
      lines.push(`G(z) num: ${coefficientList(result.g.num)}`, `G(z) den: ${coefficientList(result.g.den)}`, `delay: ${result.g.delaySamples} samples`, differenceEquationText(result.g));
    }
    if (pid?.ok) lines.push(`PID (${pid.value.method}, ${pid.value.form}): ${pid.value.equation}`);
    return lines.join('\n');
  };

  return (
    <section className="calc" aria-label={title} data-testid={id}>
      <div className="calc-head">
        <h3 className="calc-title">{title}</h3>
        <span className="calc-sub">difference equations for a chosen sample time</span>
      </div>
      <div className="calc-grid">
        <div className="calc-controls">
          <NumberField label="Sample time" value={state.ts} kind="time" unit="s" min={1e-6} onChange={(v) => set({ ts: v })} testId={`${id}-ts`} />
          <label className="calc-field">
            <span className="calc-field-label">Process method</span>
            <select value={state.method} onChange={(e) => set({ method: e.target.value as State['method'] })} data-testid={`${id}-method`}>
              <option value="zoh">Zero-order hold</option>
              <option value="tustin">Tustin (bilinear)</option>
            </select>
          </label>
          {controller ? (
            <>
              <label className="calc-field">
                <span className="calc-field-label">PID mapping</span>
                <select value={state.pidMethod} onChange={(e) => set({ pidMethod: e.target.value as State['pidMethod'] })}>
                  <option value="backward-euler">Backward Euler</option>
                  <option value="tustin">Tustin</option>
                </select>
              </label>
              <label className="calc-field">
                <span className="calc-field-label">PID output</span>
                <select value={state.pidForm} onChange={(e) => set({ pidForm: e.target.value as State['pidForm'] })}>
                  <option value="positional">Positional u[k]</option>
                  <option value="velocity">Velocity Δu[k]</option>
                </select>
              </label>
            </>
          ) : null}
        </div>
        <div className="calc-charts">
          {result.ok ? (
            <>
              <dl className="calc-facts" data-testid={`${id}-coefficients`}>
                <div><dt>num (z)</dt><dd>{coefficientList(result.g.num)}</dd></div>
                <div><dt>den (z)</dt><dd>{coefficientList(result.g.den)}</dd></div>
                <div><dt>delay</dt><dd>{result.g.delaySamples} samples</dd></div>
              </dl>
              <p className="calc-code" data-testid={`${id}-equation`}>{differenceEquationText(result.g)}</p>
            </>
          ) : (
            <p className="calc-problem" role="alert">{result.message}</p>
          )}
          {pid ? (
            pid.ok ? (
              <p className="calc-code" data-testid={`${id}-pid`}>{pid.value.equation}</p>
            ) : (
              <p className="calc-problem" role="alert">{pid.message}</p>
            )
          ) : null}
          <Chart
            title={`${title}: discrete step response`}
            xLabel="t (s)"
            yLabel="y[k]"
            series={[
              { label: 'y(t) of G(s) at the samples', color: 'slate', dash: [5, 4] },
              { label: 'y[k] of G(z), held', color: 'copper', stepped: true },
            ]}
            data={data}
            height={200}
            onChart={(u) => (chartRef.current = u)}
          />
        </div>
      </div>
      <ExportBar
        id={id}
        csv={() => [
          { header: 'k', values: result.ok ? result.step.map((_, k) => k) : [] },
          { header: 't (s)', values: result.ok ? result.t : [] },
          { header: 'y[k]', values: result.ok ? result.step : [] },
          { header: 'y(t) continuous', values: result.ok ? result.continuous : [] },
        ]}
        charts={() => [{ title, chart: chartRef.current }]}
        copy={text}
        copyWhat="coefficients"
      />
      <p className="calc-caution">Load new coefficients into a controller only with the loop in manual and as your site's change procedure requires.</p>
    </section>
  );
}
