/** Roles from lowest to highest (the auth module's order). */
export const EDITORIAL_ROLES = ['reader', 'author', 'curator', 'admin'] as const;
export type EditorialRole = (typeof EDITORIAL_ROLES)[number];

/** The signed-in person acting on a recipe (the shape of `Astro.locals.user`). */
export interface Actor {
  id: string;
  email: string;
  name: string;
  role: string;
}

/** True when `actor` holds `min` or a higher role. */
export function atLeast(actor: Actor | null | undefined, min: EditorialRole): boolean {
  return Boolean(actor) && EDITORIAL_ROLES.indexOf(actor!.role as EditorialRole) >= EDITORIAL_ROLES.indexOf(min);
}
