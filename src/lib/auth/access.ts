import { createAccessControl } from 'better-auth/plugins/access';
import { defaultStatements } from 'better-auth/plugins/admin/access';

/**
 * Permissions for better-auth's admin plugin. Managing people is admin-only; the recipe
 * actions are listed so the editorial routes can ask `auth.api.userHasPermission` if they
 * prefer a permission to a role rank (`hasRole` in roles.ts gives the same answers).
 */
export const statements = {
  ...defaultStatements,
  recipe: ['read', 'rate', 'create', 'edit-own', 'edit-any', 'review', 'publish', 'retire'],
} as const;

export const accessControl = createAccessControl(statements);

const readerCan = { recipe: ['read', 'rate'] } as const;
const authorCan = { recipe: [...readerCan.recipe, 'create', 'edit-own'] } as const;
const curatorCan = { recipe: [...authorCan.recipe, 'edit-any', 'review', 'publish', 'retire'] } as const;

/** One access-control role per Loopwright role (no one may impersonate another person). */
export const accessRoles = {
  reader: accessControl.newRole({ ...readerCan, user: [], session: [] }),
  author: accessControl.newRole({ ...authorCan, user: [], session: [] }),
  curator: accessControl.newRole({ ...curatorCan, user: [], session: [] }),
  admin: accessControl.newRole({
    ...curatorCan,
    user: ['create', 'list', 'set-role', 'ban', 'get', 'update', 'set-password'],
    session: ['list', 'revoke', 'delete'],
  }),
};
