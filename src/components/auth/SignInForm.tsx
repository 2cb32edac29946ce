import { useState, type SubmitEvent } from 'react';
import { sendJson } from './send-json';
import { buttonClass, Field, FormMessage, useHydrated } from './Field';

/** Messages for better-auth's answers, in our words. */
function signInMessage(status: number, fallback: string): string {
  if (status === 401) return 'That e-mail and password do not match an account. Check both and try again.';
  if (status === 403) return fallback;
  if (status === 429) return 'Too many sign-in attempts from this computer. Wait a few minutes, then try again.';
  return fallback;
}

/** E-mail and password; on success goes to `next` (a path on this site). */
export default function SignInForm({ next }: { next: string }) {
  const [busy, setBusy] = useState(false);
  const ready = useHydrated();
  const [error, setError] = useState<string | null>(null);

  async function submit(event: SubmitEvent<HTMLFormElement>) {
    event.preventDefault();
    // Read from the form itself: what was typed before hydration is kept.
    const fields = new FormData(event.currentTarget);
    setBusy(true);
    setError(null);
    const result = await sendJson('/api/auth/sign-in/email', { email: String(fields.get('email') ?? '').trim(), password: String(fields.get('password') ?? '') });
    if (result.ok) {
      window.location.assign(next);
      return;
    }
    setBusy(false);
    setError(signInMessage(result.status, result.message));
  }

  return (
    <form method="post" onSubmit={submit} className="space-y-4" data-testid="sign-in-form" aria-busy={busy}>
      <Field label="Work e-mail" type="email" name="email" autoComplete="username" required />
      <Field label="Password" type="password" name="password" autoComplete="current-password" required />
      <FormMessage error={error} />
      <div className="flex items-center gap-4">
        <button type="submit" className={buttonClass} disabled={busy || !ready}>{busy ? 'Signing in…' : 'Sign in'}</button>
        <a href="/forgot-password" className="text-sm">Forgot your password?</a>
      </div>
    </form>
  );
}
