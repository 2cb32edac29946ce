import { useState, type SubmitEvent } from 'react';
import { sendJson } from './send-json';
import { buttonClass, Field, FormMessage, useHydrated } from './Field';

/** Asks for a reset link; the answer is the same whether or not the address has an account. */
export default function ForgotPasswordForm() {
  const [busy, setBusy] = useState(false);
  const ready = useHydrated();
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  async function submit(event: SubmitEvent<HTMLFormElement>) {
    event.preventDefault();
    const email = String(new FormData(event.currentTarget).get('email') ?? '');
    setBusy(true);
    setError(null);
    setDone(null);
    const result = await sendJson('/api/auth/request-password-reset', { email: email.trim() });
    setBusy(false);
    if (result.ok) setDone(`If ${email.trim()} has a Loopwright account, a link to choose a new password is on its way. It works for one hour.`);
    else setError(result.status === 429 ? 'Too many requests from this computer. Wait a few minutes, then try again.' : result.message);
  }

  return (
    <form method="post" onSubmit={submit} className="space-y-4" aria-busy={busy}>
      <Field label="Work e-mail" type="email" name="email" autoComplete="username" required />
      <FormMessage error={error} done={done} />
      <button type="submit" className={buttonClass} disabled={busy || !ready}>{busy ? 'Sending…' : 'Send me a link'}</button>
    </form>
  );
}
