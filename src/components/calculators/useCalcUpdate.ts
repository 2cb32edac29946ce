import { useCallback, useLayoutEffect, useRef } from 'react';

/** The name of the performance measure every recompute-and-redraw records. */
export const CALC_UPDATE = 'calc-update';

/**
 * Times one recompute-and-redraw: `begin()` in the input handler, and the measure is recorded
 * after React has committed and the charts (whose layout effects run first, drawing
 * synchronously) have redrawn. `deps` are the values whose change means a redraw happened.
 */
export function useCalcUpdate(deps: readonly unknown[]) {
  const started = useRef<number | null>(null);
  const begin = useCallback(() => {
    if (started.current === null) started.current = performance.now();
  }, []);
  useLayoutEffect(() => {
    if (started.current === null) return;
    performance.measure(CALC_UPDATE, { start: started.current, end: performance.now() });
    started.current = null;
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, deps);
  return begin;
}
