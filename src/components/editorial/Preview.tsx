import { useEffect, useState, type ComponentType } from 'react';
import { callApi } from './api';
import { splitIslands } from '../../lib/recipes/authored-mdx/islands-in-html';
import type { AllowedComponentName } from '../../lib/recipes/authored-mdx/component-names';
import LoopResponse from '../calculators/LoopResponse';
import FrequencyView from '../calculators/FrequencyView';
import TuningComparison from '../calculators/TuningComparison';
import BlockChain from '../calculators/BlockChain';
import PidConverter from '../calculators/PidConverter';
import Discretizer from '../calculators/Discretizer';

/** The calculators a body may place, as the preview renders them (props validated by the server). */
const CALCULATORS: Record<AllowedComponentName, ComponentType<any>> = { LoopResponse, FrequencyView, TuningComparison, BlockChain, PidConverter, Discretizer };

interface Problem {
  line: number;
  column: number;
  reason: string;
}
type PreviewAnswer = { ok: true; html: string } | { ok: false; problems: Problem[] };

/**
 * The live preview beside the editor: the body compiled by the server exactly as a save
 * would (POST /api/v1/preview), shown as sanitized HTML with its calculators live, or
 * the problems with line and column. Waits for a pause in typing before asking.
 */
export default function Preview({ body, onProblemClick }: { body: string; onProblemClick(line: number, column: number): void }) {
  const [answer, setAnswer] = useState<PreviewAnswer | null>(null);
  const [state, setState] = useState<'idle' | 'working' | 'offline'>('idle');

  useEffect(() => {
    const timer = setTimeout(async () => {
      setState('working');
      const res = await callApi<PreviewAnswer>('POST', '/api/v1/preview', { body });
      if (res.ok) {
        setAnswer(res.data);
        setState('idle');
      } else setState('offline');
    }, 400);
    return () => clearTimeout(timer);
  }, [body]);

  return (
    <section className="editor-preview" aria-label="Preview" data-testid="preview">
      <p className="text-sm text-muted" aria-live="polite" data-testid="preview-state">
        {state === 'working' ? 'Updating the preview…' : state === 'offline' ? 'The preview could not be updated; your text is kept.' : 'Preview, compiled as a save would be.'}
      </p>
      {answer && !answer.ok && (
        <ul className="editor-problems" data-testid="preview-problems">
          {answer.problems.map((p, i) => (
            <li key={i}>
              <button type="button" className="link-button" onClick={() => onProblemClick(p.line, p.column)}>
                Line {p.line}, column {p.column}
              </button>
              : {p.reason}
            </li>
          ))}
        </ul>
      )}
      {answer?.ok && (
        <div className="authored-body" data-testid="preview-html">
          {/* HTML parts are the server's sanitized output; calculators render as components. */}
          {splitIslands(answer.html).map((s, i) => {
            if (s.kind === 'html') return <div key={i} dangerouslySetInnerHTML={{ __html: s.html }} />;
            const Calculator = CALCULATORS[s.name];
            return <div key={`${i}-${s.name}`} className="authored-island" data-island={s.name} data-hydrated="true"><Calculator {...s.props} id={`preview-${i}`} /></div>;
          })}
        </div>
      )}
    </section>
  );
}
