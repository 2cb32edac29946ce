import './editorial.css';
import { useEffect, useState } from 'react';
import { callApi } from './api';

interface WatchState { watching: boolean; watchers: number }

/** Watch a recipe: e-mail on a new published revision, on retirement and on field notes. */
export default function WatchButton({ slug }: { slug: string }) {
  const [state, setState] = useState<WatchState | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  useEffect(() => {
    void callApi<WatchState>('GET', `/api/v1/recipes/${slug}/watch`).then((r) => (r.ok ? setState(r.data) : setError(r.error.message)));
  }, [slug]);

  async function toggle() {
    if (!state) return;
    setBusy(true);
    setError(null);
    const r = await callApi<WatchState>(state.watching ? 'DELETE' : 'PUT', `/api/v1/recipes/${slug}/watch`);
    setBusy(false);
    if (r.ok) setState(r.data);
    else setError(r.error.message);
  }

  return (
    <span className="watch no-print">
      <button type="button" onClick={() => void toggle()} disabled={!state || busy} aria-pressed={state?.watching ?? false} data-testid="watch">
        {state?.watching ? 'Watching — stop' : 'Watch this recipe'}
      </button>
      {state && <span className="text-sm text-muted"> {state.watchers} watching</span>}
      {error && <span className="editor-error" role="alert"> {error}</span>}
    </span>
  );
}
