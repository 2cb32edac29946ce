import type { Knex } from 'knex';
import type { Auth } from './auth';
import { dropOpenLinks, INVITATION_SECONDS, newInvitationToken, pendingInvitation, recordInvitation, type InvitationRequest } from './invitations';
import { findPerson, type Person, type PersonChange } from './people';
import type { SessionUser } from './session-user';
import { authSettings } from './settings';
import { invitationMail } from '../mail/templates/invitation';
import { sendMail } from '../mail/mailer';

/** Outcome of an admin action: the person as it now stands, or a refusal with the contract's code. */
export type ActionResult =
  | { person: Person; error: null }
  | { person: null; error: { status: number; code: string; message: string; field?: string } };

const refuse = (status: number, code: string, message: string, field?: string): ActionResult => ({ person: null, error: { status, code, message, field } });

/**
 * Invites someone: creates the account without a password, opens a one-time link (a
 * better-auth reset token valid for 7 days) and e-mails it. Inviting someone whose invitation
 * is still pending sends a fresh link. If the mail cannot be sent, a new account is removed again.
 */
export async function invitePerson(auth: Auth, knex: Knex, req: InvitationRequest, by: SessionUser): Promise<ActionResult> {
  const ctx = await auth.$context;
  const existing = await ctx.internalAdapter.findUserByEmail(req.email);
  if (existing && !(await pendingInvitation(knex, existing.user.id))) {
    return refuse(409, 'conflict', `${req.email} already has an account; change its role on this page instead.`, 'email');
  }
  const user = existing?.user ?? (await ctx.internalAdapter.createUser({ email: req.email, name: req.name, role: req.role }, { method: 'admin' }));
  if (existing) {
    await ctx.internalAdapter.updateUser(user.id, { name: req.name, role: req.role });
    await dropOpenLinks(knex, user.id);
  }
  const token = newInvitationToken();
  const expiresAt = new Date(Date.now() + INVITATION_SECONDS * 1000);
  await ctx.internalAdapter.createVerificationValue({ identifier: `reset-password:${token}`, value: user.id, expiresAt });
  await recordInvitation(knex, user.id, by.id, expiresAt);
  const url = `${authSettings().baseURL}/invite?token=${encodeURIComponent(token)}`;
  try {
    await sendMail(invitationMail({ to: req.email, name: req.name, role: req.role, invitedBy: by.name, url, expiresAt }));
  } catch (err) {
    console.error('Invitation mail failed:', err instanceof Error ? err.message : err);
    if (!existing) await ctx.internalAdapter.deleteUser(user.id);
    else await dropOpenLinks(knex, user.id);
    return refuse(503, 'mail_unavailable', 'The invitation could not be e-mailed (the mail server did not accept it); nothing was saved, try again later.');
  }
  return { person: (await findPerson(knex, user.id))!, error: null };
}

/**
 * Changes a person's role and/or active state. Deactivating ends every session at once and
 * blocks sign-in; admins may not change their own account, so one admin always remains.
 */
export async function changePerson(auth: Auth, knex: Knex, id: string, change: PersonChange, by: SessionUser): Promise<ActionResult> {
  if (id === by.id) return refuse(409, 'conflict', 'You cannot change your own role or deactivate yourself; ask another admin.');
  const ctx = await auth.$context;
  const user = await ctx.internalAdapter.findUserById(id);
  if (!user) return refuse(404, 'not_found', 'There is no account with that id; reload the people list.');
  const update: Record<string, unknown> = {};
  if (change.role !== undefined) update.role = change.role;
  if (change.active === false) Object.assign(update, { banned: true, banReason: `Deactivated by ${by.email}`, banExpires: null });
  if (change.active === true) Object.assign(update, { banned: false, banReason: null, banExpires: null });
  await ctx.internalAdapter.updateUser(id, update);
  if (change.active === false) {
    await ctx.internalAdapter.deleteUserSessions(id);
    await dropOpenLinks(knex, id);
  }
  return { person: (await findPerson(knex, id))!, error: null };
}
