import { useState, type SubmitEvent } from 'react';
import { sendJson } from './send-json';
import { buttonClass, Field, FormMessage, useHydrated } from './Field';

interface Props {
  /** The one-time token from the e-mailed link. */
  token: string;
  /** Shortest password accepted, characters. */
  minLength: number;
  /** For an invitation: the address to sign in with once the password is set. */
  email?: string;
}

/** Chooses a password from an e-mailed link (invitation or reset); an invitation then signs in. */
export default function SetPasswordForm({ token, minLength, email }: Props) {
  const [busy, setBusy] = useState(false);
  const ready = useHydrated();
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);

  async function submit(event: SubmitEvent<HTMLFormElement>) {
    event.preventDefault();
    const fields = new FormData(event.currentTarget);
    const password = String(fields.get('password') ?? '');
    const again = String(fields.get('again') ?? '');
    if (password.length < minLength) return setError(`Use at least ${minLength} characters.`);
    if (password !== again) return setError('The two passwords differ; type the same one twice.');
    setBusy(true);
    setError(null);
    const result = await sendJson('/api/auth/reset-password', { token, newPassword: password });
    if (!result.ok) {
      setBusy(false);
      const expired = result.status === 400 && /token/i.test(result.message);
      return setError(expired ? 'This link has expired or was already used. Ask for a new one.' : result.message);
    }
    if (email) {
      const signedIn = await sendJson('/api/auth/sign-in/email', { email, password });
      if (signedIn.ok) return window.location.assign('/');
    }
    setBusy(false);
    setDone(true);
  }

  if (done) {
    return (
      <p role="status" className="rounded-md border-l-4 border-holds bg-paper p-3">
        Your password is set. <a href="/sign-in">Sign in with it</a>.
      </p>
    );
  }
  return (
    <form method="post" onSubmit={submit} className="space-y-4" aria-busy={busy}>
      <Field label="New password" type="password" name="password" autoComplete="new-password" required minLength={minLength}
        hint={`At least ${minLength} characters; a short sentence is easy to remember and hard to guess.`} />
      <Field label="The same password again" type="password" name="again" autoComplete="new-password" required />
      <FormMessage error={error} />
      <button type="submit" className={buttonClass} disabled={busy || !ready}>{busy ? 'Saving…' : 'Set my password'}</button>
    </form>
  );
}
