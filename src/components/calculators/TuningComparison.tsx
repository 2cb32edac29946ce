import { useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import { z } from 'zod';
import { compareWithResponses, type ComparisonResult } from '../../lib/calculators/comparison';
import { convertForm, settingRows, settingsText, type PidForm, type PidUnits } from '../../lib/calculators/pid-display';
import { formatNumber } from '../../lib/calculators/units';
import { FopdtSchema, IpdtSchema, SopdtSchema } from '../../lib/schemas/process-model';
import Chart, { type ChartSeries } from './Chart';
import { OVERLAY_COLORS } from './chart-colors';
import ExportBar from './ExportBar';
import ParamControl from './ParamControl';
import { describeError } from './describe-error';
import { modelFields, modelScale, sliderRange } from './model-fields';
import { useCalcUpdate } from './useCalcUpdate';
import { useSettled } from './useSettled';
import { useUrlState } from './useUrlState';
import './calculators.css';

const ModelSchema = z.union([FopdtSchema, SopdtSchema, IpdtSchema]);
type TuningModel = z.infer<typeof ModelSchema>;

export interface TuningComparisonProps {
  /** The process model the rules tune (fopdt, sopdt or ipdt). */
  model: TuningModel;
  /** Which controller the rules design. */
  controller: 'pi' | 'pid';
  /** Names this calculator's URL parameter; give one per instance when a page has several. */
  id?: string;
  title?: string;
}

const StateSchema = z.object({
  model: ModelSchema,
  controller: z.enum(['pi', 'pid']),
  /** 'published' shows each rule in the form its paper uses. */
  form: z.enum(['published', 'ideal', 'series', 'parallel']),
  units: z.object({ gain: z.enum(['ratio', 'pb']), integral: z.enum(['s', 'min', 'rpm']), derivative: z.enum(['s', 'min']) }),
});
type State = z.infer<typeof StateSchema>;

type Computed = { ok: true; r: ComparisonResult } | { ok: false; message: string };

/** Quiet time after the last model change before the rules are compared again, ms. */
const SETTLE_MS = 180;

function Select<T extends string>({ label, value, options, onChange, testId }: { label: string; value: T; options: [T, string][]; onChange(v: T): void; testId?: string }) {
  return (
    <label className="calc-field">
      <span className="calc-field-label">{label}</span>
      <select value={value} onChange={(e) => onChange(e.target.value as T)} data-testid={testId}>
        {options.map(([v, text]) => <option key={v} value={v}>{text}</option>)}
      </select>
    </label>
  );
}

/** Every applicable published rule side by side: settings, predicted figures, overlaid responses. */
export default function TuningComparison({ model, controller, id = 'tuning-comparison', title = 'Tuning rules compared' }: TuningComparisonProps) {
  const { state, update } = useUrlState(id, StateSchema, { model, controller, form: 'published', units: { gain: 'ratio', integral: 's', derivative: 's' } });
  const chartRef = useRef<uPlot | null>(null);

  // Every rule is analysed several times over: recompute once the sliders rest, not on each step.
  const beginRef = useRef<() => void>(() => {});
  const { settled: settledModel, pending } = useSettled(state.model, SETTLE_MS, () => beginRef.current());
  const computed = useMemo<Computed>(() => {
    try {
      return { ok: true, r: compareWithResponses({ model: settledModel, controller: state.controller }) };
    } catch (error) {
      return { ok: false, message: describeError(error) };
    }
  }, [settledModel, state.controller]);
  const begin = useCalcUpdate([computed, state.form, state.units]);
  beginRef.current = begin;
  const set = (change: (s: State) => State) => {
    begin();
    update(change);
  };

  const shown = useMemo(() => {
    if (!computed.ok) return [];
    return computed.r.rows.map((row) => ({ row, settings: state.form === 'published' ? row.pid : convertForm(row.pid, state.form as PidForm) }));
  }, [computed, state.form]);

  const series = useMemo<ChartSeries[]>(
    () => (computed.ok ? computed.r.rows.filter((r) => r.y).map((r, i) => ({ label: r.name, color: OVERLAY_COLORS[i % OVERLAY_COLORS.length]! })) : []),
    [computed],
  );
  const data = useMemo<uPlot.AlignedData>(() => {
    if (!computed.ok) return [[]];
    return [computed.r.t, ...computed.r.rows.filter((r) => r.y).map((r) => r.y!)];
  }, [computed]);

  const values = state.model as unknown as Record<string, number>;
  const start = model as unknown as Record<string, number>;
  const units = state.units as PidUnits;
  // The filter settings are the same for every rule, and a PI has no derivative column to show.
  const visible = (key: string) => key !== 'n' && key !== 'tf' && !(state.controller === 'pi' && (key === 'td' || key === 'kd'));
  const settingHeads = shown[0]?.settings ? settingRows(shown[0].settings, units).filter((s) => visible(s.key)) : [];

  return (
    <section className="calc" aria-label={title} data-testid={id}>
      <div className="calc-head">
        <h3 className="calc-title">{title}</h3>
        <span className="calc-sub">published rules on the same model, with the loop each predicts</span>
      </div>
      <div className="calc-grid">
        <div className="calc-controls">
          <fieldset className="calc-group">
            <legend>Process ({state.model.type})</legend>
            {modelFields(state.model).map((f) => (
              <ParamControl
                key={f.key}
                label={f.label}
                kind={f.kind}
                unit={f.unit}
                min={f.min}
                value={values[f.key] ?? 0}
                range={sliderRange(f, start[f.key] ?? 0, modelScale(model))}
                onChange={(v) => update((s) => ({ ...s, model: { ...s.model, [f.key]: v } as TuningModel }))}
                testId={`${id}-${f.key}`}
              />
            ))}
          </fieldset>
          <Select label="Controller" value={state.controller} options={[['pi', 'PI'], ['pid', 'PID']]} onChange={(v) => set((s) => ({ ...s, controller: v }))} testId={`${id}-kind`} />
          <Select label="Show in form" value={state.form} options={[['published', 'as published'], ['ideal', 'ideal'], ['series', 'series'], ['parallel', 'parallel']]} onChange={(v) => set((s) => ({ ...s, form: v }))} testId={`${id}-form`} />
          <Select label="Gain as" value={state.units.gain} options={[['ratio', 'gain'], ['pb', 'PB %']]} onChange={(gain) => set((s) => ({ ...s, units: { ...s.units, gain } }))} testId={`${id}-gain-unit`} />
          <Select label="Integral as" value={state.units.integral} options={[['s', 's'], ['min', 'min'], ['rpm', 'repeats/min']]} onChange={(integral) => set((s) => ({ ...s, units: { ...s.units, integral } }))} testId={`${id}-integral-unit`} />
          <Select label="Derivative as" value={state.units.derivative} options={[['s', 's'], ['min', 'min']]} onChange={(derivative) => set((s) => ({ ...s, units: { ...s.units, derivative } }))} />
        </div>
        <div className="calc-charts">
          {computed.ok ? (
            <div className="calc-scroll" style={{ opacity: pending ? 0.55 : 1 }} aria-busy={pending}>
              <table className="calc-table" data-testid={`${id}-table`}>
                <caption className="sr-only">Settings and predicted figures of each rule</caption>
                <thead>
                  <tr>
                    <th scope="col">Rule</th>
                    <th scope="col">Form</th>
                    {settingHeads.map((h) => <th key={h.key} scope="col">{h.label}{h.unit && h.unit !== 'off' ? ` (${h.unit})` : ''}</th>)}
                    <th scope="col">Overshoot (%)</th>
                    <th scope="col">Settling (s)</th>
                    <th scope="col">Ms</th>
                    <th scope="col">GM</th>
                    <th scope="col">PM (°)</th>
                    <th scope="col">Load IAE</th>
                  </tr>
                </thead>
                <tbody>
                  {shown.map(({ row, settings }) => (
                    <tr key={row.rule} data-rule={row.rule}>
                      <th scope="row" title={row.source}>
                        {row.name}
                        {!row.inRange ? <div className="calc-note" title={row.rangeNote}>outside its stated range</div> : null}
                        {row.via !== 'model' ? <div className="calc-note">{row.via === 'half-rule' ? 'via the half rule' : 'via the ultimate point'}</div> : null}
                        {!row.predicted.stable ? <div className="calc-problem">unstable on this model</div> : null}
                      </th>
                      <td>{settings ? settings.form : '—'}</td>
                      {settings
                        ? settingRows(settings, units).filter((s) => visible(s.key)).map((s) => <td key={s.key} className="calc-num">{s.value === null ? 'off' : formatNumber(s.value)}</td>)
                        : settingHeads.map((h) => <td key={h.key} className="calc-num">—</td>)}
                      <td className="calc-num">{formatNumber(row.predicted.overshootPct)}</td>
                      <td className="calc-num">{formatNumber(row.predicted.settlingTime)}</td>
                      <td className="calc-num">{formatNumber(row.predicted.stable ? row.predicted.ms : null)}</td>
                      <td className="calc-num">{formatNumber(row.predicted.gainMargin)}</td>
                      <td className="calc-num">{formatNumber(row.predicted.phaseMarginDeg)}</td>
                      <td className="calc-num">{formatNumber(row.predicted.loadIae)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
              {computed.r.skipped.length ? (
                <p className="calc-note">Not shown: {computed.r.skipped.map((s) => s.reason).join(' ')}</p>
              ) : null}
            </div>
          ) : (
            <p className="calc-problem" role="alert">{computed.message}</p>
          )}
          <Chart title={`${title}: setpoint steps`} xLabel="t (s)" yLabel="PV per unit setpoint" series={series} data={data} height={260} onChart={(u) => (chartRef.current = u)} testId={`${id}-chart`} />
        </div>
      </div>
      <ExportBar
        id={id}
        csv={() => (computed.ok ? [{ header: 't (s)', values: computed.r.t }, ...computed.r.rows.filter((r) => r.y).map((r) => ({ header: `PV, ${r.name}`, values: r.y! }))] : [])}
        charts={() => [{ title: `${title}: setpoint steps`, chart: chartRef.current }]}
        copy={() => shown.map(({ row, settings }) => `${row.name}: ${settings ? settingsText(settings, units) : 'no equivalent in this form'}`).join('\n')}
        copyWhat="settings"
      />
      <p className="calc-caution">Predicted figures hold for the model, not the plant: enter new settings with the loop in manual, respect interlocks and the safety system, and watch the first setpoint change.</p>
    </section>
  );
}
