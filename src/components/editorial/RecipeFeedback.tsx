import './editorial.css';
import { useEffect, useState } from 'react';

export interface RecipeFeedbackProps {
  slug: string;
  /** Ratings are given to published and retired recipes. */
  rateable: boolean;
  /** The signed-in person's own rating, if any. */
  mine: { stars: number; note: string | null } | null;
  watching: boolean;
  watchers: number;
}

/**
 * What a reader gives back on a recipe page, kept small (pages carry a JavaScript budget): the
 * watch toggle, and 1–5 stars with a field note. The average, count and notes are rendered by
 * the server (RecipeEditorial.astro); after a rating the page reloads to show them.
 */
export default function RecipeFeedback({ slug, rateable, mine, watching: initiallyWatching, watchers: initialWatchers }: RecipeFeedbackProps) {
  const api = `/api/v1/recipes/${slug}`;
  const [ready, setReady] = useState(false);
  const [watch, setWatch] = useState({ watching: initiallyWatching, watchers: initialWatchers });
  const [stars, setStars] = useState(mine?.stars ?? 0);
  const [note, setNote] = useState(mine?.note ?? '');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState('');
  useEffect(() => setReady(true), []);

  async function call(method: 'PUT' | 'DELETE', path: string, body?: unknown) {
    setBusy(true);
    setError('');
    // A plain fetch rather than api.ts: on every recipe page, one chunk fewer counts against the budget.
    let answer: { watching: boolean; watchers: number; error?: { message: string } } | null = null;
    let ok = false;
    try {
      const res = await fetch(path, { method, headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body ?? {}) });
      ok = res.ok;
      answer = await res.json();
    } catch {
      answer = null;
    }
    setBusy(false);
    if (!ok) setError(answer?.error?.message ?? 'The server could not be reached; try again.');
    return ok ? answer : null;
  }

  async function rate() {
    if (stars < 1) return setError('Choose 1 to 5 stars first.');
    if (await call('PUT', `${api}/rating`, { stars, ...(note.trim() ? { note } : {}) })) window.location.reload();
  }

  return (
    <div className="rating-panel" data-testid="rating-panel" data-ready={ready ? 'true' : undefined}>
      <p>
        <button type="button" disabled={busy} aria-pressed={watch.watching} data-testid="watch"
          onClick={async () => { const d = await call(watch.watching ? 'DELETE' : 'PUT', `${api}/watch`); if (d) setWatch(d); }}>
          {watch.watching ? 'Watching — stop' : 'Watch this recipe'}
        </button>
        <span className="text-sm text-muted"> {watch.watchers} watching</span>
      </p>
      {rateable && (
        <>
          <div role="radiogroup" aria-label="Your rating">
            {[1, 2, 3, 4, 5].map((n) => (
              <button key={n} type="button" role="radio" aria-checked={stars === n} aria-label={`${n} of 5`} className={n <= stars ? 'star on' : 'star'} onClick={() => setStars(n)} data-testid={`star-${n}`}>★</button>
            ))}
          </div>
          <label className="editor-field">
            <span>Field note (optional): what happened when you used it</span>
            <textarea rows={3} value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} placeholder="Used on TIC-214; needed ti 20 % longer because the valve sticks." data-testid="note-input" />
          </label>
          <button type="button" onClick={() => void rate()} disabled={busy} data-testid="rate">{busy ? 'Saving…' : mine ? 'Change my rating' : 'Save my rating'}</button>
        </>
      )}
      {error && <p className="editor-error" role="alert">{error}</p>}
    </div>
  );
}
