import { useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import * as z from 'zod/mini';
import { LinkControllerSchema, LinkModelSchema } from '../../lib/calculators/link-state';
import { frequencyView, type FrequencyViewResult } from '../../lib/calculators/frequency-view';
import { formatNumber, formatWithUnit } from '../../lib/calculators/units';
import type { PidControllerInput } from '../../lib/schemas/controller';
import type { ProcessModelInput } from '../../lib/schemas/process-model';
import type { TransferFunctionInput } from '../../lib/schemas/transfer-function';
import Chart, { type ChartMarker } from './Chart';
import ExportBar from './ExportBar';
import LoopControls from './LoopControls';
import { describeError } from './describe-error';
import { useCalcUpdate } from './useCalcUpdate';
import { useUrlState } from './useUrlState';
import './calculators.css';

export interface FrequencyViewProps {
  model: ProcessModelInput;
  controller: PidControllerInput;
  /** Measurement path H(s); default 1. */
  sensor?: TransferFunctionInput;
  /** Names this calculator's URL parameter; give one per instance when a page has several. */
  id?: string;
  title?: string;
}

const StateSchema = z.object({ model: LinkModelSchema, controller: LinkControllerSchema });
type State = z.infer<typeof StateSchema>;

/** The phase axis stops here: past two turns a long dead time only adds unreadable decades. */
const PHASE_FLOOR = -720;
/** The Nyquist view: the neighbourhood of −1 where margins are read. */
const NYQUIST_X = { min: -2.5, max: 1, fixed: true };
const NYQUIST_Y = { min: -2.5, max: 1, fixed: true };

type Computed = { ok: true; r: FrequencyViewResult } | { ok: false; message: string };

function bodeMarkers(r: FrequencyViewResult): { mag: ChartMarker[]; phase: ChartMarker[] } {
  const m = r.margins;
  const mag: ChartMarker[] = [{ axis: 'y', value: 0, label: '0 dB', color: 'muted' }];
  const phase: ChartMarker[] = [{ axis: 'y', value: -180, label: '−180°', color: 'muted' }];
  if (m.gainCrossover !== null) {
    const pm = `PM ${formatNumber(m.phaseMarginDeg)}° at ${formatNumber(m.gainCrossover)} rad/s`;
    mag.push({ axis: 'x', value: m.gainCrossover, label: pm, color: 'holds' });
    phase.push({ axis: 'x', value: m.gainCrossover, label: pm, color: 'holds' });
  }
  if (m.phaseCrossover !== null) {
    const gm = `GM ${formatNumber(m.gainMargin)} at ${formatNumber(m.phaseCrossover)} rad/s`;
    mag.push({ axis: 'x', value: m.phaseCrossover, label: gm, color: 'copper' });
    phase.push({ axis: 'x', value: m.phaseCrossover, label: gm, color: 'copper' });
  }
  return { mag, phase };
}

/** Bode magnitude and phase of L with both margins marked, and the Nyquist curve with the Ms circle. */
export default function FrequencyView({ model, controller, sensor, id = 'frequency-view', title = 'Frequency view' }: FrequencyViewProps) {
  const { state, update } = useUrlState(id, StateSchema, { model, controller });
  const charts = useRef<Record<'mag' | 'phase' | 'nyquist', uPlot | null>>({ mag: null, phase: null, nyquist: null });

  const computed = useMemo<Computed>(() => {
    try {
      return { ok: true, r: frequencyView({ model: state.model, controller: state.controller, sensor }) };
    } catch (error) {
      return { ok: false, message: describeError(error) };
    }
  }, [state, sensor]);
  const begin = useCalcUpdate([computed]);

  const data = useMemo(() => {
    if (!computed.ok) return { mag: [[], []] as uPlot.AlignedData, phase: [[], []] as uPlot.AlignedData, nyquist: [null, [[], []], [[], []], [[], []]] as (null | [number[], number[]])[] };
    const r = computed.r;
    return {
      mag: [r.w, r.magDb] as uPlot.AlignedData,
      phase: [r.w, r.phaseDeg] as uPlot.AlignedData,
      nyquist: [null, [r.re, r.im], [r.circle.re, r.circle.im], [[-1], [0]]] as (null | [number[], number[]])[],
    };
  }, [computed]);
  const markers = useMemo(() => (computed.ok ? bodeMarkers(computed.r) : { mag: [], phase: [] }), [computed]);

  const change = (part: keyof State) => (key: string, value: number) => {
    begin();
    update((s) => ({ ...s, [part]: { ...s[part], [key]: value } }) as State);
  };
  const m = computed.ok ? computed.r.margins : null;

  return (
    <section className="calc" aria-label={title} data-testid={id}>
      <div className="calc-head">
        <h3 className="calc-title">{title}</h3>
        <span className="calc-sub">loop frequency response L = C·G·H</span>
      </div>
      <div className="calc-grid">
        <div className="calc-controls">
          <LoopControls id={id} model={state.model} controller={state.controller} initialModel={model} initialController={controller} onModel={change('model')} onController={change('controller')} />
        </div>
        <div className="calc-charts">
          {m ? (
            <dl className="calc-facts" data-testid={`${id}-margins`}>
              <div><dt>Phase margin</dt><dd data-testid={`${id}-pm`}>{formatWithUnit(m.phaseMarginDeg, '°')}</dd></div>
              <div><dt>Gain margin</dt><dd data-testid={`${id}-gm`}>{formatNumber(m.gainMargin)}</dd></div>
              <div><dt>GM (dB)</dt><dd>{formatNumber(m.gainMarginDb)}</dd></div>
              <div><dt>Delay margin</dt><dd>{formatWithUnit(m.delayMargin, 's')}</dd></div>
              <div><dt>ωgc</dt><dd>{formatNumber(m.gainCrossover)}</dd></div>
              <div><dt>ωpc</dt><dd>{formatNumber(m.phaseCrossover)}</dd></div>
              <div><dt>Ms</dt><dd data-testid={`${id}-ms`}>{formatNumber(m.ms)}</dd></div>
              <div><dt>Mt</dt><dd>{formatNumber(m.mt)}</dd></div>
            </dl>
          ) : (
            <p className="calc-problem" role="alert">{computed.ok ? '' : computed.message}</p>
          )}
          <Chart title={`${title}: magnitude`} xLabel="ω (rad/s)" yLabel="|L| (dB)" logX series={[{ label: '|L|', color: 'copper', unit: 'dB' }]} data={data.mag} markers={markers.mag} height={180} onChart={(u) => (charts.current.mag = u)} testId={`${id}-mag-chart`} />
          <Chart title={`${title}: phase`} xLabel="ω (rad/s)" yLabel="phase (°)" logX yRange={{ min: PHASE_FLOOR }} series={[{ label: '∠L', color: 'slate', unit: '°' }]} data={data.phase} markers={markers.phase} height={180} onChart={(u) => (charts.current.phase = u)} testId={`${id}-phase-chart`} />
          <Chart
            title={`${title}: Nyquist`}
            xLabel="Re L(jω)"
            yLabel="Im L(jω)"
            xy
            square
            xRange={NYQUIST_X}
            yRange={NYQUIST_Y}
            series={[
              { label: 'L(jω), ω > 0', color: 'copper' },
              { label: '1/Ms circle around −1', color: 'holds', dash: [5, 4], width: 1.5 },
              { label: '−1', color: 'fails', dots: true },
            ]}
            data={data.nyquist}
            height={420}
            onChart={(u) => (charts.current.nyquist = u)}
            testId={`${id}-nyquist-chart`}
          />
        </div>
      </div>
      <ExportBar
        id={id}
        csv={() => {
          const r = computed.ok ? computed.r : null;
          return [
            { header: 'w (rad/s)', values: r?.w ?? [] },
            { header: '|L|', values: r?.magDb.map((db) => 10 ** (db / 20)) ?? [] },
            { header: '|L| (dB)', values: r?.magDb ?? [] },
            { header: 'phase (deg)', values: r?.phaseDeg ?? [] },
            { header: 'Re L', values: r?.re ?? [] },
            { header: 'Im L', values: r?.im ?? [] },
          ];
        }}
        charts={() => [
          { title: `${title}: magnitude`, chart: charts.current.mag },
          { title: `${title}: phase`, chart: charts.current.phase },
          { title: `${title}: Nyquist`, chart: charts.current.nyquist },
        ]}
        copy={() => (m ? `${title}: phase margin ${formatNumber(m.phaseMarginDeg)}° at ${formatNumber(m.gainCrossover)} rad/s, gain margin ${formatNumber(m.gainMargin)} (${formatNumber(m.gainMarginDb)} dB) at ${formatNumber(m.phaseCrossover)} rad/s, delay margin ${formatNumber(m.delayMargin)} s, Ms ${formatNumber(m.ms)}` : '')}
        copyWhat="margins"
      />
    </section>
  );
}
