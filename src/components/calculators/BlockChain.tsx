import { useMemo, useRef, useState } from 'react';
import type uPlot from 'uplot';
import { z } from 'zod';
import { analyze } from '../../lib/control/analyze';
import { chain } from '../../lib/control/connect';
import { BLOCK_NAMES, blockToTf, defaultBlock, moveItem } from '../../lib/calculators/blocks';
import { transferFunctionLatex, transferFunctionText } from '../../lib/calculators/latex';
import { BLOCK_KINDS, BlockSchema, type Block, type BlockKind } from '../../lib/schemas/block';
import BlockEditor from './BlockEditor';
import Chart from './Chart';
import ExportBar from './ExportBar';
import NumberField from './NumberField';
import { describeError } from './describe-error';
import { useCalcUpdate } from './useCalcUpdate';
import { useTypeset } from './useTypeset';
import { useUrlState } from './useUrlState';
import './calculators.css';

export interface BlockChainProps {
  /** The forward path, in signal order (actuator → process → …). */
  blocks: Block[];
  /** The measurement block (a transmitter lag, an analyser delay). */
  sensor?: Block;
  /** Names this calculator's URL parameter; give one per instance when a page has several. */
  id?: string;
  title?: string;
}

const StateSchema = z.object({
  blocks: z.array(BlockSchema).max(12),
  sensor: BlockSchema.nullable(),
  /** Horizon in s; null = chosen by the engine. */
  tFinal: z.number().positive().nullable(),
});
type State = z.infer<typeof StateSchema>;

const POINTS = 501;

function compute(state: State) {
  const plant = state.blocks.length ? state.blocks.map(blockToTf) : [{ num: [1], den: [1], delay: 0 }];
  const sensor = state.sensor ? blockToTf(state.sensor) : undefined;
  const combined = chain(plant);
  const measuredTf = sensor ? chain([combined, sensor]) : combined;
  const measured = analyze({ plant, sensor, analyses: { step: { tFinal: state.tFinal ?? undefined, points: POINTS } } }).step!;
  const output = sensor ? analyze({ plant, analyses: { step: { tFinal: measured.tFinal, points: POINTS } } }).step! : measured;
  return { combined, measuredTf, sensor, measured, output };
}

/** Chains of blocks combined into one transfer function, typeset, with the step response of the chain. */
export default function BlockChain({ blocks, sensor, id = 'block-chain', title = 'Block chain' }: BlockChainProps) {
  const { state, update } = useUrlState(id, StateSchema, { blocks, sensor: sensor ?? null, tFinal: null });
  const [adding, setAdding] = useState<BlockKind>('first-order');
  const chartRef = useRef<uPlot | null>(null);

  const computed = useMemo(() => {
    try {
      return { ok: true as const, ...compute(state) };
    } catch (error) {
      return { ok: false as const, message: describeError(error) };
    }
  }, [state]);
  const begin = useCalcUpdate([computed]);
  const change = (next: (s: State) => State) => {
    begin();
    update(next);
  };

  const tex = useMemo(() => {
    if (!computed.ok) return '';
    const factors = state.blocks.map((b) => `\\left(${transferFunctionLatex(blockToTf(b))}\\right)`).join('');
    const g = `G(s) = ${state.blocks.length > 1 ? `${factors} = ` : ''}${transferFunctionLatex(computed.combined)}`;
    if (!computed.sensor) return g;
    return `\\begin{gathered} ${g} \\\\[4pt] H(s) = ${transferFunctionLatex(computed.sensor)} \\\\[4pt] G(s)\\,H(s) = ${transferFunctionLatex(computed.measuredTf)} \\end{gathered}`;
  }, [computed, state.blocks]);
  const html = useTypeset(tex);
  const plain = computed.ok
    ? [`G(s) = ${transferFunctionText(computed.combined)}`, ...(computed.sensor ? [`G(s)·H(s) = ${transferFunctionText(computed.measuredTf)}`] : [])]
    : [];

  const data = useMemo<uPlot.AlignedData>(() => {
    if (!computed.ok) return [[], [], []];
    return [computed.measured.t, computed.output.y, computed.measured.y];
  }, [computed]);

  const setBlock = (i: number, block: Block) => change((s) => ({ ...s, blocks: s.blocks.map((b, j) => (j === i ? block : b)) }));

  return (
    <section className="calc" aria-label={title} data-testid={id}>
      <div className="calc-head">
        <h3 className="calc-title">{title}</h3>
        <span className="calc-sub">blocks in series, combined into one transfer function</span>
      </div>
      <div className="calc-grid">
        <div className="calc-controls">
          <ol className="calc-blocks" aria-label="Blocks in signal order" data-testid={`${id}-blocks`}>
            {state.blocks.map((b, i) => (
              <li key={i} className="calc-block" data-kind={b.kind}>
                <div className="calc-block-head">
                  <strong>{i + 1}. {b.label || BLOCK_NAMES[b.kind]}</strong>
                  <button type="button" className="calc-icon" aria-label={`Move block ${i + 1} up`} disabled={i === 0} onClick={() => change((s) => ({ ...s, blocks: moveItem(s.blocks, i, i - 1) }))} data-testid={`${id}-up-${i}`}>↑</button>
                  <button type="button" className="calc-icon" aria-label={`Move block ${i + 1} down`} disabled={i === state.blocks.length - 1} onClick={() => change((s) => ({ ...s, blocks: moveItem(s.blocks, i, i + 1) }))} data-testid={`${id}-down-${i}`}>↓</button>
                  <button type="button" className="calc-icon" aria-label={`Remove block ${i + 1}`} onClick={() => change((s) => ({ ...s, blocks: s.blocks.filter((_, j) => j !== i) }))} data-testid={`${id}-remove-${i}`}>✕</button>
                </div>
                <BlockEditor block={b} onChange={(next) => setBlock(i, next)} testId={`${id}-block-${i}`} />
              </li>
            ))}
          </ol>
          <div className="calc-block-head">
            <label className="sr-only" htmlFor={`${id}-kind`}>Kind of block to add</label>
            <select id={`${id}-kind`} value={adding} onChange={(e) => setAdding(e.target.value as BlockKind)} data-testid={`${id}-kind`}>
              {BLOCK_KINDS.map((k) => <option key={k} value={k}>{BLOCK_NAMES[k]}</option>)}
            </select>
            <button type="button" className="calc-button" disabled={state.blocks.length >= 12} onClick={() => change((s) => ({ ...s, blocks: [...s.blocks, defaultBlock(adding)] }))} data-testid={`${id}-add`}>Add block</button>
          </div>
          <div className="calc-block" data-testid={`${id}-sensor`}>
            <div className="calc-block-head">
              <strong>Sensor {state.sensor ? `· ${state.sensor.label || BLOCK_NAMES[state.sensor.kind]}` : '(none: H = 1)'}</strong>
              {state.sensor ? (
                <button type="button" className="calc-icon" aria-label="Remove the sensor block" onClick={() => change((s) => ({ ...s, sensor: null }))}>✕</button>
              ) : (
                <button type="button" className="calc-icon" aria-label="Add a sensor lag" onClick={() => change((s) => ({ ...s, sensor: { kind: 'first-order', k: 1, tau: 2, label: 'Transmitter' } }))}>+ lag</button>
              )}
            </div>
            {state.sensor ? <BlockEditor block={state.sensor} onChange={(next) => change((s) => ({ ...s, sensor: next }))} testId={`${id}-sensor-block`} /> : null}
          </div>
          <NumberField label="Horizon" kind="time" unit="s" min={1e-3} value={state.tFinal ?? (computed.ok ? computed.measured.tFinal : 100)} onChange={(v) => change((s) => ({ ...s, tFinal: v }))} testId={`${id}-horizon`} />
        </div>
        <div className="calc-charts">
          {computed.ok ? (
            <div className="calc-math" style={{ minHeight: computed.sensor ? '12rem' : '5rem' }} data-testid={`${id}-tf`} data-tf={JSON.stringify(computed.combined)}>
              {html ? <div dangerouslySetInnerHTML={{ __html: html }} /> : plain.map((line) => <p key={line} className="calc-code">{line}</p>)}
            </div>
          ) : (
            <p className="calc-problem" role="alert" data-testid={`${id}-error`}>{computed.message}</p>
          )}
          <Chart
            title={`${title}: unit step of the chain`}
            xLabel="t (s)"
            yLabel="response per unit step"
            series={[
              { label: 'Process output', color: 'copper' },
              { label: 'Measured (through sensor)', color: 'slate', dash: [6, 4] },
            ]}
            data={data}
            height={240}
            onChart={(u) => (chartRef.current = u)}
            testId={`${id}-chart`}
          />
        </div>
      </div>
      <ExportBar
        id={id}
        csv={() => [
          { header: 't (s)', values: computed.ok ? computed.measured.t : [] },
          { header: 'process output', values: computed.ok ? computed.output.y : [] },
          { header: 'measured', values: computed.ok ? computed.measured.y : [] },
        ]}
        charts={() => [{ title, chart: chartRef.current }]}
        copy={() => (computed.ok ? [`G(s): num [${computed.combined.num.join(', ')}], den [${computed.combined.den.join(', ')}], dead time ${computed.combined.delay} s`, ...plain].join('\n') : '')}
        copyWhat="transfer function"
      />
    </section>
  );
}
