import './editorial.css';
import { useEffect, useState } from 'react';
import { callApi, type ApiError } from './api';

interface Rating { average: number | null; count: number }
interface Note { name: string; stars: number; note: string; updatedAt: string }
interface NotesAnswer { rating: Rating; mine: { stars: number; note: string | null } | null; notes: Note[] }

/** Stars (1–5) and a field note from the reader, the recipe's average and count, and everyone's notes. */
export default function RatingPanel({ slug, initialRating }: { slug: string; initialRating: Rating }) {
  const [rating, setRating] = useState<Rating>(initialRating);
  const [notes, setNotes] = useState<Note[]>([]);
  const [stars, setStars] = useState(0);
  const [note, setNote] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<ApiError | null>(null);
  const [saved, setSaved] = useState(false);
  const [ready, setReady] = useState(false);

  async function load() {
    const res = await callApi<NotesAnswer>('GET', `/api/v1/recipes/${slug}/notes`);
    if (!res.ok) return;
    setRating(res.data.rating);
    setNotes(res.data.notes);
    if (res.data.mine) {
      setStars(res.data.mine.stars);
      setNote((n) => n || res.data.mine!.note || '');
    }
  }
  useEffect(() => {
    setReady(true);
    void load();
  }, [slug]);

  async function send() {
    if (stars < 1) {
      setError({ code: 'invalid_request', message: 'Choose 1 to 5 stars first.' });
      return;
    }
    setBusy(true);
    setError(null);
    setSaved(false);
    const res = await callApi<{ rating: Rating }>('PUT', `/api/v1/recipes/${slug}/rating`, { stars, ...(note.trim() ? { note } : {}) });
    setBusy(false);
    if (!res.ok) return setError(res.error);
    setRating(res.data.rating);
    setSaved(true);
    await load();
  }

  return (
    <section className="rating-panel no-print" aria-labelledby="rating-heading" data-testid="rating-panel" data-ready={ready ? 'true' : undefined}>
      <h2 id="rating-heading">Ratings and field notes</h2>
      <p data-testid="rating-summary">
        {rating.count ? `${rating.average?.toFixed(1)} of 5 from ${rating.count} ${rating.count === 1 ? 'person' : 'people'}` : 'Nobody has rated it yet.'}
      </p>
      <div className="star-row" role="radiogroup" aria-label="Your rating">
        {[1, 2, 3, 4, 5].map((n) => (
          <button key={n} type="button" role="radio" aria-checked={stars === n} aria-label={`${n} star${n > 1 ? 's' : ''}`} className={n <= stars ? 'star on' : 'star'} onClick={() => setStars(n)} data-testid={`star-${n}`}>
            ★
          </button>
        ))}
      </div>
      <label className="editor-field">
        <span>Field note (optional): what happened when you used it</span>
        <textarea rows={3} value={note} maxLength={2000} onChange={(e) => setNote(e.target.value)} placeholder="Used on TIC-214; needed ti 20 % longer because the valve sticks." data-testid="note-input" />
      </label>
      <button type="button" onClick={() => void send()} disabled={busy} data-testid="rate">{busy ? 'Saving…' : 'Save my rating'}</button>
      <span aria-live="polite">
        {error && <span className="editor-error" role="alert"> {error.message}</span>}
        {saved && <span className="editor-notice" data-testid="rating-saved"> Thank you — saved.</span>}
      </span>
      {notes.length > 0 && (
        <ul className="field-notes" data-testid="field-notes">
          {notes.map((n, i) => (
            <li key={i}>
              <strong>{n.name}</strong> · {n.stars}/5 · <time dateTime={n.updatedAt}>{n.updatedAt.slice(0, 10)}</time>
              <p>{n.note}</p>
            </li>
          ))}
        </ul>
      )}
    </section>
  );
}
