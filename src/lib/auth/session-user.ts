import { z } from 'zod';
import { roleSchema } from './roles';

/** The signed-in person as pages and API routes see them (`Astro.locals.user`). */
export const sessionUserSchema = z.object({
  /** better-auth's user id. */
  id: z.string(),
  /** Sign-in address, lower case. */
  email: z.string(),
  /** Name as shown in the header and on recipes. */
  name: z.string(),
  /** Role; an unknown stored value is read as the lowest role. */
  role: roleSchema.catch('reader'),
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

/** The fields we keep from better-auth's user record. */
export function toSessionUser(user: { id: string; email: string; name: string; role?: string | null }): SessionUser {
  return sessionUserSchema.parse({ id: user.id, email: user.email, name: user.name, role: user.role ?? 'reader' });
}
