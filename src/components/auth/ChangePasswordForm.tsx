import { useState, type SubmitEvent } from 'react';
import { sendJson } from './send-json';
import { buttonClass, Field, FormMessage, useHydrated } from './Field';

/** Changes the signed-in person's password; other sessions are signed out. */
export default function ChangePasswordForm({ minLength }: { minLength: number }) {
  const [busy, setBusy] = useState(false);
  const ready = useHydrated();
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  async function submit(event: SubmitEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const fields = new FormData(form);
    const currentPassword = String(fields.get('current') ?? '');
    const newPassword = String(fields.get('password') ?? '');
    setDone(null);
    if (newPassword.length < minLength) return setError(`Use at least ${minLength} characters for the new password.`);
    if (newPassword !== fields.get('again')) return setError('The two new passwords differ; type the same one twice.');
    setBusy(true);
    setError(null);
    const result = await sendJson('/api/auth/change-password', { currentPassword, newPassword, revokeOtherSessions: true });
    setBusy(false);
    if (!result.ok) return setError(result.status === 400 && /password/i.test(result.message) ? 'The current password is not right; nothing was changed.' : result.message);
    form.reset();
    setDone('Password changed. You stay signed in here; other sessions were signed out.');
  }

  return (
    <form method="post" onSubmit={submit} className="max-w-md space-y-4" aria-busy={busy} data-testid="change-password-form">
      <Field label="Current password" type="password" name="current" autoComplete="current-password" required />
      <Field label="New password" type="password" name="password" autoComplete="new-password" required minLength={minLength} hint={`At least ${minLength} characters.`} />
      <Field label="The new password again" type="password" name="again" autoComplete="new-password" required />
      <FormMessage error={error} done={done} />
      <button type="submit" className={buttonClass} disabled={busy || !ready}>{busy ? 'Saving…' : 'Change password'}</button>
    </form>
  );
}
