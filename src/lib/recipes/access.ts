import type { RecipeRecord } from './record';

/** Who is asking: the signed-in person's e-mail and role, or null. */
export interface Viewer {
  email: string;
  role: string;
}

/** Roles that see every recipe, drafts and reviews included. */
const SEES_EVERYTHING = new Set(['curator', 'admin']);

/**
 * The signed-in viewer from `Astro.locals`, and whether sign-in is in force at all. The
 * sign-in middleware always sets `locals.user` (null when signed out); where it is absent,
 * no sign-in exists yet and the recipe routes are open. This is the one place that decides.
 */
export function viewerOf(locals: object): { viewer: Viewer | null; signInRequired: boolean } {
  if (!('user' in locals)) return { viewer: null, signInRequired: false };
  const user = (locals as { user: Viewer | null }).user;
  return { viewer: user ? { email: user.email, role: user.role } : null, signInRequired: true };
}

/** Drafts and recipes in review are seen by their author (the owner) and by curators and admins. */
export function canSee(viewer: Viewer | null, record: RecipeRecord): boolean {
  const status = record.data.status;
  if (status === 'published' || status === 'retired') return true;
  if (!viewer) return false;
  return SEES_EVERYTHING.has(viewer.role) || viewer.email.toLowerCase() === record.data.owner.email.toLowerCase();
}
