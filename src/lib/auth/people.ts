import type { Knex } from 'knex';
import { z } from 'zod';
import { roleSchema, type Role } from './roles';

/** Where an account stands: invited (no password yet), active, or deactivated (cannot sign in). */
export const personStatusSchema = z.enum(['invited', 'active', 'deactivated']);
export type PersonStatus = z.infer<typeof personStatusSchema>;

/** One account as the admin people page lists it. */
export interface Person {
  id: string;
  name: string;
  email: string;
  role: Role;
  status: PersonStatus;
  /** When the account was created, ISO 8601. */
  createdAt: string;
  /** When the pending invitation's link stops working, ISO 8601; null unless invited. */
  invitationExpiresAt: string | null;
}

/** What an admin may change about an account (at least one field). */
export const personChangeSchema = z
  .object({
    /** New role. */
    role: roleSchema.optional(),
    /** false deactivates (signs out everywhere, blocks sign-in); true reactivates. */
    active: z.boolean({ error: 'active is true or false.' }).optional(),
  })
  .strict()
  .refine((c) => c.role !== undefined || c.active !== undefined, { error: 'Say what to change: role, active, or both.' });
export type PersonChange = z.infer<typeof personChangeSchema>;

function toPerson(row: Record<string, any>): Person {
  const status: PersonStatus = row.banned ? 'deactivated' : row.invited_pending ? 'invited' : 'active';
  return {
    id: row.id,
    name: row.name,
    email: row.email,
    role: roleSchema.catch('reader').parse(row.role),
    status,
    createdAt: row.created_at,
    invitationExpiresAt: row.invited_pending ? row.expires_at : null,
  };
}

function peopleQuery(knex: Knex) {
  return knex('users as u')
    .leftJoin('invitations as i', 'i.user_id', 'u.id')
    .select('u.id', 'u.name', 'u.email', 'u.role', 'u.banned', 'u.created_at', 'i.expires_at', knex.raw('(i.id is not null and i.accepted_at is null) as invited_pending'));
}

/** Everyone with an account, by name. */
export async function listPeople(knex: Knex): Promise<Person[]> {
  return (await peopleQuery(knex).orderByRaw('lower(u.name)')).map(toPerson);
}

/** One account, or null. */
export async function findPerson(knex: Knex, id: string): Promise<Person | null> {
  const row = await peopleQuery(knex).where('u.id', id).first();
  return row ? toPerson(row) : null;
}
