import { useState, type SubmitEvent } from 'react';
import type { Person } from '../../lib/auth/people';
import { ROLE_LABELS, ROLES, type Role } from '../../lib/auth/roles';
import { sendJson } from './send-json';
import { buttonClass, Field, FormMessage, useHydrated } from './Field';

const STATUS_LABELS: Record<Person['status'], string> = { invited: 'Invited, no password yet', active: 'Active', deactivated: 'Deactivated' };

function RoleSelect({ value, onChange, label, disabled }: { value: Role; onChange(r: Role): void; label: string; disabled?: boolean }) {
  return (
    <select aria-label={label} value={value} disabled={disabled} onChange={(e) => onChange(e.target.value as Role)}
      className="rounded-md border border-rule bg-paper px-2 py-1">
      {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
    </select>
  );
}

function InviteForm({ onInvited }: { onInvited(p: Person): void }) {
  const [busy, setBusy] = useState(false);
  const ready = useHydrated();
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  async function submit(event: SubmitEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const fields = new FormData(form);
    setBusy(true);
    setError(null);
    setDone(null);
    const result = await sendJson<{ person: Person }>('/api/admin/invitations', { email: fields.get('email'), name: fields.get('name'), role: fields.get('role') });
    setBusy(false);
    if (!result.ok) return setError(result.message);
    onInvited(result.data.person);
    setDone(`Invitation sent to ${result.data.person.email}.`);
    form.reset();
  }

  return (
    <form method="post" onSubmit={submit} className="grid gap-3 rounded-lg border border-rule bg-panel p-4 md:grid-cols-[1fr_1fr_auto_auto] md:items-end" aria-busy={busy} data-testid="invite-form">
      <Field label="Name" name="name" required />
      <Field label="Work e-mail" type="email" name="email" required />
      <label className="block text-sm font-semibold">Starts as
        <div className="mt-1">
          <select name="role" aria-label="Role of the new person" defaultValue="reader" className="rounded-md border border-rule bg-paper px-2 py-1">
            {ROLES.map((r) => <option key={r} value={r}>{ROLE_LABELS[r]}</option>)}
          </select>
        </div>
      </label>
      <button type="submit" className={buttonClass} disabled={busy || !ready}>{busy ? 'Sending…' : 'Send invitation'}</button>
      <div className="md:col-span-4"><FormMessage error={error} done={done} /></div>
    </form>
  );
}

function PersonRow({ person, isMe, onChanged }: { person: Person; isMe: boolean; onChanged(p: Person): void }) {
  const [role, setRole] = useState<Role>(person.role);
  const [busy, setBusy] = useState(false);
  const ready = useHydrated();
  const [error, setError] = useState<string | null>(null);

  async function change(body: { role?: Role; active?: boolean }) {
    setBusy(true);
    setError(null);
    const result = await sendJson<{ person: Person }>(`/api/admin/people/${encodeURIComponent(person.id)}`, body, 'PATCH');
    setBusy(false);
    if (!result.ok) return setError(result.message);
    onChanged(result.data.person);
  }

  return (
    <tr className="border-t border-rule align-top" data-testid="person-row" data-email={person.email}>
      <td className="py-2 pr-3 font-semibold">{person.name}{isMe && <span className="ml-1 text-xs font-normal text-muted">(you)</span>}</td>
      <td className="py-2 pr-3 text-sm">{person.email}</td>
      <td className="py-2 pr-3">
        <div className="flex flex-wrap gap-2">
          <RoleSelect label={`Role of ${person.name}`} value={role} onChange={setRole} disabled={isMe || busy} />
          {role !== person.role && <button type="button" className="text-sm font-semibold text-copper" disabled={busy || !ready} onClick={() => change({ role })}>Save role</button>}
        </div>
      </td>
      <td className="py-2 pr-3 text-sm" data-testid="person-status">{STATUS_LABELS[person.status]}</td>
      <td className="py-2 text-sm">
        {!isMe && (person.status === 'deactivated'
          ? <button type="button" disabled={busy || !ready} className="font-semibold text-holds" onClick={() => change({ active: true })}>Reactivate</button>
          : <button type="button" disabled={busy || !ready} className="font-semibold text-fails" onClick={() => change({ active: false })}>Deactivate</button>)}
        {error && <p role="alert" className="mt-1 text-fails">{error}</p>}
      </td>
    </tr>
  );
}

/** The admin's people page: invite someone, change roles, deactivate and reactivate accounts. */
export default function PeopleAdmin({ initialPeople, currentUserId }: { initialPeople: Person[]; currentUserId: string }) {
  const [people, setPeople] = useState(initialPeople);
  const upsert = (p: Person) => setPeople((list) => [...list.filter((x) => x.id !== p.id), p].sort((a, b) => a.name.localeCompare(b.name)));
  return (
    <div className="space-y-6">
      <section aria-labelledby="invite-heading">
        <h2 id="invite-heading" className="mb-2 text-xl font-semibold">Invite someone</h2>
        <InviteForm onInvited={upsert} />
      </section>
      <section aria-labelledby="people-heading" className="overflow-x-auto">
        <h2 id="people-heading" className="mb-2 text-xl font-semibold">Everyone with an account</h2>
        <table className="w-full text-left">
          <thead className="text-sm text-muted"><tr><th className="pr-3">Name</th><th className="pr-3">E-mail</th><th className="pr-3">Role</th><th className="pr-3">Status</th><th>Access</th></tr></thead>
          <tbody>{people.map((p) => <PersonRow key={`${p.id}-${p.role}-${p.status}`} person={p} isMe={p.id === currentUserId} onChanged={upsert} />)}</tbody>
        </table>
      </section>
    </div>
  );
}
