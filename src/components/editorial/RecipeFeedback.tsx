import './editorial.css';
import { useEffect, useState } from 'react';
import { callApi } from './api';

interface Rating { average: number | null; count: number }
interface Note { name: string; stars: number; note: string; updatedAt: string }
interface Notes { rating: Rating; mine: { stars: number; note: string | null } | null; notes: Note[] }
interface Watch { watching: boolean; watchers: number }

/**
 * What a reader gives back on a recipe page, in one island (pages carry a JavaScript budget):
 * watching (mail on new published revisions, retirement and field notes) and, on published or
 * retired recipes, 1–5 stars with a field note, the average, the count and everyone's notes.
 */
export default function RecipeFeedback({ slug, rateable, initialRating }: { slug: string; rateable: boolean; initialRating: Rating }) {
  const api = `/api/v1/recipes/${slug}`;
  const [ready, setReady] = useState(false);
  const [watch, setWatch] = useState<Watch | null>(null);
  const [rating, setRating] = useState(initialRating);
  const [notes, setNotes] = useState<Note[]>([]);
  const [stars, setStars] = useState(0);
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState('');
  const [saved, setSaved] = useState(false);

  async function load() {
    const r = await callApi<Notes>('GET', `${api}/notes`);
    if (!r.ok) return;
    setRating(r.data.rating);
    setNotes(r.data.notes);
    if (r.data.mine) {
      setStars(r.data.mine.stars);
      setNote((n) => n || r.data.mine!.note || '');
    }
  }
  useEffect(() => {
    setReady(true);
    void callApi<Watch>('GET', `${api}/watch`).then((r) => (r.ok ? setWatch(r.data) : setError(r.error.message)));
    if (rateable) void load();
  }, [slug]);

  async function send(method: 'PUT' | 'DELETE', path: string, body?: unknown) {
    setBusy(true);
    setError('');
    setSaved(false);
    const r = await callApi<Watch & { rating: Rating }>(method, path, body);
    setBusy(false);
    if (!r.ok) setError(r.error.message);
    return r.ok ? r.data : null;
  }

  async function rate() {
    if (stars < 1) return setError('Choose 1 to 5 stars first.');
    const d = await send('PUT', `${api}/rating`, { stars, ...(note.trim() ? { note } : {}) });
    if (!d) return;
    setRating(d.rating);
    setSaved(true);
    await load();
  }

  return (
    <section className="rating-panel no-print" aria-labelledby="feedback-heading" data-testid="rating-panel" data-ready={ready ? 'true' : undefined}>
      <p>
        <button type="button" disabled={!watch || busy} aria-pressed={watch?.watching ?? false} data-testid="watch"
          onClick={async () => { const d = watch && (await send(watch.watching ? 'DELETE' : 'PUT', `${api}/watch`)); if (d) setWatch(d); }}>
          {watch?.watching ? 'Watching — stop' : 'Watch this recipe'}
        </button>
        {watch && <span className="text-sm text-muted"> {watch.watchers} watching</span>}
      </p>
      {rateable && (
        <>
          <h2 id="feedback-heading">Ratings and field notes</h2>
          <p data-testid="rating-summary">
            {rating.count ? `${rating.average?.toFixed(1)} of 5 from ${rating.count} ${rating.count === 1 ? 'person' : 'people'}` : 'Nobody has rated it yet.'}
          </p>
          <div role="radiogroup" aria-label="Your rating">
            {[1, 2, 3, 4, 5].map((n) => (
              <button key={n} type="button" role="radio" aria-checked={stars === n} aria-label={`${n} of 5`} className={n <= stars ? 'star on' : 'star'} onClick={() => setStars(n)} data-testid={`star-${n}`}>★</button>
            ))}
          </div>
          <label className="editor-field">
            <span>Field note (optional): what happened when you used it</span>
            <textarea rows={3} value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} placeholder="Used on TIC-214; needed ti 20 % longer because the valve sticks." data-testid="note-input" />
          </label>
          <button type="button" onClick={() => void rate()} disabled={busy} data-testid="rate">{busy ? 'Saving…' : 'Save my rating'}</button>
          {saved && <span className="editor-notice" data-testid="rating-saved"> Thank you — saved.</span>}
          {notes.length > 0 && (
            <ul className="field-notes" data-testid="field-notes">
              {notes.map((n, i) => <li key={i}><strong>{n.name}</strong> · {n.stars}/5 · {n.updatedAt.slice(0, 10)}<p>{n.note}</p></li>)}
            </ul>
          )}
        </>
      )}
      {error && <p className="editor-error" role="alert">{error}</p>}
    </section>
  );
}
