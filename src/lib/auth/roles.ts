import { z } from 'zod';

/** Roles from lowest to highest; each one may do everything the ones before it may. */
export const ROLES = ['reader', 'author', 'curator', 'admin'] as const;

/** A person's role: reader (reads and rates), author (writes recipes), curator (reviews, publishes, retires), admin (manages people). */
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

/** Position of a role in ROLES (0 for reader); an unknown role ranks below every known one. */
export function roleRank(role: string | null | undefined): number {
  return ROLES.indexOf(role as Role);
}

/** True when `user` is signed in and holds `min` or a higher role. */
export function hasRole(user: { role?: string | null } | null | undefined, min: Role): boolean {
  return Boolean(user) && roleRank(user!.role) >= roleRank(min);
}

/** What each role is called on screen. */
export const ROLE_LABELS: Record<Role, string> = {
  reader: 'Reader',
  author: 'Author',
  curator: 'Curator',
  admin: 'Admin',
};
