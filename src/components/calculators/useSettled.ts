import { useEffect, useRef, useState } from 'react';

/**
 * The value once it has stopped changing for `delayMs`, for calculations too heavy to redo on
 * every slider step (the tuning comparison runs dozens of analyses). The first value is taken
 * at once, so the server's HTML and hydration agree. `onSettle` runs just before it is taken.
 */
export function useSettled<T>(value: T, delayMs: number, onSettle?: () => void): { settled: T; pending: boolean } {
  const [settled, setSettled] = useState(value);
  const callback = useRef(onSettle);
  callback.current = onSettle;
  useEffect(() => {
    if (Object.is(value, settled)) return;
    const timer = setTimeout(() => {
      callback.current?.();
      setSettled(value);
    }, delayMs);
    return () => clearTimeout(timer);
  }, [value, settled, delayMs]);
  return { settled, pending: !Object.is(value, settled) };
}
