import { useEffect, useRef, useState } from 'react';
import { callApi } from './api';

interface Problem {
  line: number;
  column: number;
  reason: string;
}
type PreviewAnswer = { ok: true; html: string } | { ok: false; problems: Problem[] };

/**
 * The live preview beside the editor: the body compiled by the server exactly as a save
 * would (POST /api/v1/preview), shown as sanitized HTML with its calculators hydrated, or
 * the problems with line and column. Waits for a pause in typing before asking.
 */
export default function Preview({ body, onProblemClick }: { body: string; onProblemClick(line: number, column: number): void }) {
  const [answer, setAnswer] = useState<PreviewAnswer | null>(null);
  const [state, setState] = useState<'idle' | 'working' | 'offline'>('idle');
  const pane = useRef<HTMLDivElement>(null);

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

  useEffect(() => {
    const el = pane.current;
    if (!el || !answer?.ok) return;
    // The HTML is the server's sanitized output; calculators inside are mounted by the hydrator.
    document.dispatchEvent(new CustomEvent('loopwright:unmount-islands', { detail: el }));
    el.innerHTML = answer.html;
    document.dispatchEvent(new Event('loopwright:islands'));
  }, [answer]);

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
      <div ref={pane} className="authored-body prose" hidden={!answer?.ok} data-testid="preview-html" />
    </section>
  );
}
