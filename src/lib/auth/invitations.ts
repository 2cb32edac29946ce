import { randomBytes } from 'node:crypto';
import type { Knex } from 'knex';
import { z } from 'zod';
import { roleSchema } from './roles';

/** How long an invitation link works, s. */
export const INVITATION_SECONDS = 7 * 24 * 60 * 60;

/** What an admin fills in to invite someone. */
export const invitationRequestSchema = z.object({
  /** Their work address; they sign in with it. */
  email: z.email({ error: 'Give a valid e-mail address, e.g. name@brindlewood.example.' }).trim().toLowerCase().max(254),
  /** Full name as colleagues know it. */
  name: z.string({ error: 'Give the person’s name.' }).trim().min(1, 'Give the person’s name.').max(120, 'Keep the name under 120 characters.'),
  /** Role they start with. */
  role: roleSchema,
});
export type InvitationRequest = z.infer<typeof invitationRequestSchema>;

/** A fresh, unguessable link token (32 bytes, URL-safe). */
export function newInvitationToken(): string {
  return randomBytes(32).toString('base64url');
}

/** Records (or renews) the invitation of `userId`. */
export async function recordInvitation(knex: Knex, userId: string, invitedBy: string | null, expiresAt: Date): Promise<void> {
  await knex('invitations')
    .insert({ user_id: userId, invited_by: invitedBy, invited_at: new Date().toISOString(), expires_at: expiresAt.toISOString(), accepted_at: null })
    .onConflict('user_id')
    .merge(['invited_by', 'invited_at', 'expires_at', 'accepted_at']);
}

/** Called when someone sets a password through an emailed link: a pending invitation is taken up. */
export async function markInvitationAccepted(knex: Knex, userId: string): Promise<void> {
  const now = new Date().toISOString();
  const changed = await knex('invitations').where({ user_id: userId }).whereNull('accepted_at').update({ accepted_at: now });
  if (changed) await knex('users').where({ id: userId }).update({ email_verified: 1, updated_at: now });
}

/** The pending invitation of a user, or null when there is none (accepted or never invited). */
export async function pendingInvitation(knex: Knex, userId: string): Promise<{ invitedAt: string; expiresAt: string } | null> {
  const row = await knex('invitations').where({ user_id: userId }).whereNull('accepted_at').first();
  return row ? { invitedAt: row.invited_at, expiresAt: row.expires_at } : null;
}

/** Removes every emailed link (invitation or reset) still open for a user. */
export async function dropOpenLinks(knex: Knex, userId: string): Promise<void> {
  await knex('verifications').where({ value: userId }).andWhere('identifier', 'like', 'reset-password:%').delete();
}
