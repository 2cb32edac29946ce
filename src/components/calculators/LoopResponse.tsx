import { useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import * as z from 'zod/mini';
import { LinkControllerSchema, LinkModelSchema } from '../../lib/calculators/link-state';
import { analyzeLoop, type LoopResult } from '../../lib/calculators/loop';
import { checkClaims } from '../../lib/calculators/claims';
import { settingsText, DEFAULT_UNITS } from '../../lib/calculators/pid-display';
import type { PidControllerInput } from '../../lib/schemas/controller';
import type { ProcessModelInput } from '../../lib/schemas/process-model';
import type { TransferFunctionInput } from '../../lib/schemas/transfer-function';
import type { Claim } from '../../lib/schemas/claim';
import type { PidController } from '../../lib/control/types';
import Chart from './Chart';
import ClaimList from './ClaimList';
import ExportBar from './ExportBar';
import NumberField from './NumberField';
import LoopControls from './LoopControls';
import StepFacts from './StepFacts';
import { describeError } from './describe-error';
import { useCalcUpdate } from './useCalcUpdate';
import { useUrlState } from './useUrlState';
import './calculators.css';

export interface LoopResponseProps {
  /** The process model (fopdt, sopdt, ipdt or a transfer function). */
  model: ProcessModelInput;
  /** The controller in any contract form. */
  controller: PidControllerInput;
  /** Measurement path H(s), e.g. a sensor lag; default 1. */
  sensor?: TransferFunctionInput;
  /** The recipe's performance claims, shown holding or failing as the settings change. */
  claims?: Claim[];
  /** Horizon in s; chosen from the model when absent. */
  tFinal?: number;
  /** Names this calculator's URL parameter; give one per instance when a page has several. */
  id?: string;
  title?: string;
}

const StateSchema = z.object({
  model: LinkModelSchema,
  controller: LinkControllerSchema,
  /** Horizon in s; null = the one chosen from the recipe's own numbers. */
  tFinal: z.nullable(z.number().check(z.positive())),
});
type State = z.infer<typeof StateSchema>;

type Computed = { ok: true; result: LoopResult } | { ok: false; message: string };

function compute(state: State, sensor: TransferFunctionInput | undefined, horizon: number | undefined): Computed {
  try {
    return { ok: true, result: analyzeLoop({ model: state.model, controller: state.controller, sensor, tFinal: state.tFinal ?? horizon }) };
  } catch (error) {
    return { ok: false, message: describeError(error) };
  }
}

/** Closed-loop setpoint and load steps with live settings, step figures and the recipe's claims. */
export default function LoopResponse(props: LoopResponseProps) {
  const { model, controller, sensor, claims = [], tFinal, id = 'loop-response', title = 'Loop response' } = props;
  const initial: State = { model, controller, tFinal: null };
  const { state, update } = useUrlState(id, StateSchema, initial);
  const charts = useRef<{ setpoint: uPlot | null; load: uPlot | null }>({ setpoint: null, load: null });

  // The horizon comes from the recipe's numbers and stays put while sliders move.
  const horizon = useMemo(() => {
    if (tFinal !== undefined) return tFinal;
    const first = compute(initial, sensor, undefined);
    return first.ok ? first.result.tFinal : undefined;
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [JSON.stringify(model), JSON.stringify(controller), JSON.stringify(sensor), tFinal]);

  const computed = useMemo(() => compute(state, sensor, horizon), [state, sensor, horizon]);
  const begin = useCalcUpdate([computed]);

  const setpointData = useMemo<uPlot.AlignedData>(() => {
    if (!computed.ok) return [[], [], []];
    const { t, y } = computed.result.setpoint;
    // The setpoint goes first so the response is drawn over it.
    return [t, t.map(() => 1), y];
  }, [computed]);
  const loadData = useMemo<uPlot.AlignedData>(() => (computed.ok ? [computed.result.load.t, computed.result.load.y] : [[], []]), [computed]);
  const checks = useMemo(() => (computed.ok ? checkClaims(claims, computed.result.figures) : []), [computed, claims]);

  const setModel = (key: string, value: number) => {
    begin();
    update((s) => ({ ...s, model: { ...s.model, [key]: value } as ProcessModelInput }));
  };
  const setController = (key: string, value: number) => {
    begin();
    update((s) => ({ ...s, controller: { ...s.controller, [key]: value } as PidControllerInput }));
  };

  const copyText = () => {
    const m = state.model;
    const modelText =
      m.type === 'tf'
        ? `G(s) = [${m.num.join(', ')}]/[${m.den.join(', ')}], dead time ${m.delay ?? 0} s`
        : `${m.type.toUpperCase()} ${Object.entries(m).filter(([k]) => k !== 'type').map(([k, v]) => `${k} = ${v}`).join(', ')}`;
    return `${title}\nController ${settingsText(state.controller as PidController, DEFAULT_UNITS)}\nModel ${modelText}`;
  };

  return (
    <section className="calc" aria-label={title} data-testid={id}>
      <div className="calc-head">
        <h3 className="calc-title">{title}</h3>
        <span className="calc-sub">closed-loop setpoint and load steps</span>
      </div>
      <div className="calc-grid">
        <div className="calc-controls">
          <LoopControls
            id={id}
            model={state.model}
            controller={state.controller}
            initialModel={model}
            initialController={controller}
            onModel={setModel}
            onController={setController}
          />
          <NumberField
            label="Horizon"
            kind="time"
            unit="s"
            min={1e-3}
            value={state.tFinal ?? horizon ?? 100}
            onChange={(v) => {
              begin();
              update({ tFinal: v });
            }}
            testId={`${id}-horizon`}
          />
        </div>
        <div className="calc-charts">
          {computed.ok ? (
            <>
              {!computed.result.stable ? <p className="calc-problem" role="alert">The closed loop is unstable with these settings: lower the gain or lengthen the integral time.</p> : null}
              <StepFacts id={id} result={computed.result} />
              <ClaimList checks={checks} testId={`${id}-claims`} />
            </>
          ) : (
            <p className="calc-problem" role="alert" data-testid={`${id}-error`}>{computed.message}</p>
          )}
          <Chart
            title={`${title}: setpoint step`}
            xLabel="t (s)"
            yLabel="PV per unit setpoint"
            series={[
              { label: 'Setpoint', color: 'muted', dash: [5, 4], width: 1 },
              { label: 'PV', color: 'copper' },
            ]}
            data={setpointData}
            height={220}
            onChart={(u) => (charts.current.setpoint = u)}
            testId={`${id}-setpoint-chart`}
          />
          <Chart
            title={`${title}: load step at the process input`}
            xLabel="t (s)"
            yLabel="PV per unit load"
            series={[{ label: 'PV after load step', color: 'slate' }]}
            data={loadData}
            height={180}
            onChart={(u) => (charts.current.load = u)}
            testId={`${id}-load-chart`}
          />
        </div>
      </div>
      <ExportBar
        id={id}
        csv={() => [
          { header: 't (s)', values: computed.ok ? computed.result.setpoint.t : [] },
          { header: 'PV, setpoint step', values: computed.ok ? computed.result.setpoint.y : [] },
          { header: 'PV, load step', values: computed.ok ? computed.result.load.y : [] },
        ]}
        charts={() => [
          { title: `${title}: setpoint step`, chart: charts.current.setpoint },
          { title: `${title}: load step`, chart: charts.current.load },
        ]}
        copy={copyText}
        copyWhat="tuning"
      />
      <p className="calc-caution">
        Try new settings with the loop in manual or on a planned test, with interlocks and the safety system in service; where a food-safety hold temperature is involved, it is a legal limit, not a tuning target.
      </p>
    </section>
  );
}

