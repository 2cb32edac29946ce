import { useEffect, useState } from 'react';
import type { InputHTMLAttributes } from 'react';

/** A labelled input in Loopwright's form style. */
export function Field({ label, hint, ...input }: { label: string; hint?: string } & InputHTMLAttributes<HTMLInputElement>) {
  return (
    <label className="block">
      <span className="block text-sm font-semibold">{label}</span>
      <input {...input} className="mt-1 w-full rounded-md border border-rule bg-paper px-3 py-2 text-base" />
      {hint && <span className="mt-1 block text-xs text-muted">{hint}</span>}
    </label>
  );
}

/** The inline message under a form: an error (role=alert) or a confirmation (role=status). */
export function FormMessage({ error, done }: { error?: string | null; done?: string | null }) {
  if (error) return <p role="alert" className="rounded-md border-l-4 border-fails bg-paper p-2 text-sm text-fails">{error}</p>;
  if (done) return <p role="status" className="rounded-md border-l-4 border-holds bg-paper p-2 text-sm text-holds">{done}</p>;
  return null;
}

export const buttonClass =
  'rounded-md bg-copper px-4 py-2 font-semibold text-panel disabled:cursor-wait disabled:opacity-60 hover:opacity-90';

/** False during server rendering and until React has hydrated: submit buttons wait for it, so a click never falls through to a plain form post. */
export function useHydrated(): boolean {
  const [ready, setReady] = useState(false);
  useEffect(() => setReady(true), []);
  return ready;
}
