import './editorial.css';
import { useEffect, useState } from 'react';
import { callApi, type ApiError } from './api';

interface Revision { revision: number; authorEmail: string; createdAt: string; message: string }
interface DiffRun { op: 'added' | 'removed' | 'same'; lines: string[] }
interface DiffAnswer { from: number; to: number; added: number; removed: number; runs: DiffRun[] }

/** The revisions of a recipe and a readable line diff between any two of them. */
export default function RevisionHistory({ slug }: { slug: string }) {
  const [revisions, setRevisions] = useState<Revision[]>([]);
  const [from, setFrom] = useState(0);
  const [to, setTo] = useState(0);
  const [diff, setDiff] = useState<DiffAnswer | null>(null);
  const [error, setError] = useState<ApiError | null>(null);

  useEffect(() => {
    void callApi<{ revisions: Revision[]; current: number }>('GET', `/api/v1/recipes/${slug}/revisions`).then((r) => {
      if (!r.ok) return setError(r.error);
      setRevisions(r.data.revisions);
      setTo(r.data.current);
      setFrom(Math.max(1, r.data.current - 1));
    });
  }, [slug]);

  useEffect(() => {
    if (!from || !to) return;
    void callApi<DiffAnswer>('GET', `/api/v1/recipes/${slug}/diff?from=${from}&to=${to}`).then((r) => (r.ok ? (setDiff(r.data), setError(null)) : setError(r.error)));
  }, [slug, from, to]);

  const picker = (value: number, set: (n: number) => void, label: string) => (
    <label>
      {label}{' '}
      <select value={value} onChange={(e) => set(Number(e.target.value))} data-testid={`diff-${label.toLowerCase()}`}>
        {revisions.map((r) => <option key={r.revision} value={r.revision}>{r.revision}</option>)}
      </select>
    </label>
  );

  return (
    <div className="revision-history" data-testid="revision-history">
      <table>
        <thead><tr><th>Revision</th><th>When</th><th>Who</th><th>What changed</th></tr></thead>
        <tbody>
          {revisions.map((r) => (
            <tr key={r.revision}><td>{r.revision}</td><td><time dateTime={r.createdAt}>{r.createdAt.replace('T', ' ').slice(0, 16)}</time></td><td>{r.authorEmail}</td><td>{r.message}</td></tr>
          ))}
        </tbody>
      </table>
      {revisions.length > 1 && (
        <p className="diff-pickers">Compare {picker(from, setFrom, 'From')} {picker(to, setTo, 'To')}</p>
      )}
      {error && <p className="editor-error" role="alert">{error.message}</p>}
      {diff && (
        <>
          <p className="text-sm" data-testid="diff-summary">{diff.added} lines added, {diff.removed} removed between revision {diff.from} and {diff.to}.</p>
          <pre className="diff" data-testid="diff">
            {diff.runs.flatMap((run, i) =>
              run.lines.map((line, j) => (
                <span key={`${i}-${j}`} className={`diff-${run.op}`}>{run.op === 'added' ? '+ ' : run.op === 'removed' ? '− ' : '  '}{line}{'\n'}</span>
              )),
            )}
          </pre>
        </>
      )}
    </div>
  );
}
