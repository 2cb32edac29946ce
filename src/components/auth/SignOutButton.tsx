import { useState } from 'react';

/** Ends the session and returns to the sign-in page. */
export default function SignOutButton() {
  const [busy, setBusy] = useState(false);
  async function signOut() {
    setBusy(true);
    await fetch('/api/auth/sign-out', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: '{}' }).catch(() => null);
    window.location.assign('/sign-in');
  }
  return (
    <button type="button" onClick={signOut} disabled={busy} data-testid="sign-out" className="whitespace-nowrap rounded-md border border-rule px-2 py-1 text-sm text-muted hover:text-ink">
      {busy ? 'Signing out…' : 'Sign out'}
    </button>
  );
}
