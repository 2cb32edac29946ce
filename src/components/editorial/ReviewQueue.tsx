import './editorial.css';
import { useEffect, useState } from 'react';
import { callApi, type ApiError } from './api';

interface Waiting { slug: string; title: string; ownerEmail: string; submittedAt: string | null; revision: number; url: string }
interface Stale { slug: string; title: string; source: string; reviewedAt: string | null; rating: { average: number | null; count: number }; reasons: string[]; url: string }
interface Queue { waiting: Waiting[]; stale: Stale[]; staleDays: number }

/** The curator's queue: what waits for review (publish or return from here) and which published recipes are stale. */
export default function ReviewQueue() {
  const [queue, setQueue] = useState<Queue | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [busy, setBusy] = useState<string | null>(null);
  const [comments, setComments] = useState<Record<string, string>>({});

  async function load() {
    const r = await callApi<Queue>('GET', '/api/v1/review-queue');
    if (r.ok) setQueue(r.data);
    else setError(r.error);
  }
  useEffect(() => void load(), []);

  async function act(slug: string, action: 'publish' | 'return') {
    setBusy(slug);
    setError(null);
    const r = await callApi('POST', `/api/v1/recipes/${slug}/${action}`, action === 'return' ? { comment: comments[slug] ?? '' } : undefined);
    setBusy(null);
    if (!r.ok) return setError(r.error);
    await load();
  }

  if (!queue) return <p aria-live="polite">{error ? error.message : 'Loading the queue…'}</p>;
  return (
    <div className="review-queue" data-testid="review-queue">
      {error && <p className="editor-error" role="alert">{error.message}</p>}
      <h2>Waiting for review ({queue.waiting.length})</h2>
      {queue.waiting.length === 0 ? <p>Nothing waits for review.</p> : (
        <ul className="queue-list">
          {queue.waiting.map((w) => (
            <li key={w.slug} data-testid={`waiting-${w.slug}`}>
              <a href={w.url}>{w.title}</a> — revision {w.revision}, from {w.ownerEmail}{w.submittedAt ? `, submitted ${w.submittedAt.slice(0, 10)}` : ''}{' '}
              (<a href={`${w.url}/history`}>changes</a>)
              <div className="queue-actions">
                <button type="button" disabled={busy === w.slug} onClick={() => void act(w.slug, 'publish')} data-testid={`publish-${w.slug}`}>Approve and publish</button>
                <input aria-label={`Comments for ${w.title}`} placeholder="Comments for the author" value={comments[w.slug] ?? ''} onChange={(e) => setComments({ ...comments, [w.slug]: e.target.value })} />
                <button type="button" disabled={busy === w.slug} onClick={() => void act(w.slug, 'return')}>Return with comments</button>
              </div>
            </li>
          ))}
        </ul>
      )}
      <h2>Stale published recipes ({queue.stale.length})</h2>
      <p className="text-sm text-muted">Not reviewed for over {queue.staleDays} days, or rated below 3 by two or more people.</p>
      {queue.stale.length === 0 ? <p>None.</p> : (
        <ul className="queue-list">
          {queue.stale.map((s) => (
            <li key={s.slug} data-testid={`stale-${s.slug}`}>
              <a href={s.url}>{s.title}</a> ({s.source}) — {s.reasons.join('; ')}
              {s.reviewedAt ? `; last reviewed ${s.reviewedAt.slice(0, 10)}` : ''}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
