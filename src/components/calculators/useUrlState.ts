import { useCallback, useEffect, useRef, useState } from 'react';
import type { output } from 'zod/v4/core';
import { readState, writeState, type StateSchema } from '../../lib/calculators/url-state';

/** How long the address waits after the last change before it is rewritten, ms. */
const WRITE_DELAY_MS = 250;

/** Ids in use on this page: two calculators with one id would overwrite each other's link state. */
const mounted = new Map<string, number>();

/**
 * State kept in the page address under the island's own parameter. The first render uses
 * `initial` (so the server's HTML and hydration agree); right after hydration a shared link's
 * state, if valid, replaces it. Changes are written with history.replaceState, debounced; the
 * parameter is removed when the state is back to `initial`.
 */
export function useUrlState<S extends StateSchema>(id: string, schema: S, initial: output<S>) {
  type State = output<S>;
  const [state, setState] = useState<State>(initial);
  const initialJson = useRef(JSON.stringify(initial));
  const restored = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);

  useEffect(() => {
    const count = (mounted.get(id) ?? 0) + 1;
    mounted.set(id, count);
    if (count > 1) console.warn(`Two calculators on this page use the id "${id}"; give each its own id prop so links keep both.`);
    return () => {
      mounted.set(id, (mounted.get(id) ?? 1) - 1);
    };
  }, [id]);

  useEffect(() => {
    const fromLink = readState(window.location.search, id, schema);
    if (fromLink !== null) setState(fromLink);
    restored.current = true;
  }, [id, schema]);

  useEffect(() => {
    if (!restored.current) return;
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => {
      const atDefault = JSON.stringify(state) === initialJson.current;
      const next = writeState(window.location.href, id, atDefault ? null : state);
      window.history.replaceState(window.history.state, '', next);
    }, WRITE_DELAY_MS);
    return () => {
      if (timer.current) clearTimeout(timer.current);
    };
  }, [id, state]);

  const update = useCallback((change: Partial<State> | ((s: State) => State)) => {
    setState((s: State) => (typeof change === 'function' ? change(s) : ({ ...(s as object), ...(change as object) } as State)));
  }, []);

  return { state, setState, update };
}
