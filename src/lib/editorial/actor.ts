import { hasRole, type Role } from '../auth/roles';

/** A role in the editorial flow (the auth module's roles, lowest to highest). */
export type EditorialRole = Role;

/** The signed-in person acting on a recipe (the shape of `Astro.locals.user`). */
export interface Actor {
  id: string;
  email: string;
  name: string;
  role: string;
}

/** True when `actor` holds `min` or a higher role (the auth module's rank check). */
export const atLeast: (actor: Actor | null | undefined, min: EditorialRole) => boolean = hasRole;
