import type { EditorialRole } from './actor';

/** A recipe's place in the editorial flow. */
export const STATUSES = ['draft', 'in_review', 'published', 'retired'] as const;
export type RecipeStatus = (typeof STATUSES)[number];

/** The actions that move a recipe between statuses. */
export type Transition = 'submit' | 'publish' | 'return' | 'retire';

/**
 * The state machine: draft → in_review (its owner submits) → published (a curator approves) or
 * back to draft (a curator returns it with comments); published → retired (a curator, with a reason).
 */
export const TRANSITIONS: Record<Transition, { from: RecipeStatus; to: RecipeStatus; minRole: EditorialRole; ownerOnly: boolean; verb: string }> = {
  submit: { from: 'draft', to: 'in_review', minRole: 'author', ownerOnly: true, verb: 'submitted for review' },
  publish: { from: 'in_review', to: 'published', minRole: 'curator', ownerOnly: false, verb: 'published' },
  return: { from: 'in_review', to: 'draft', minRole: 'curator', ownerOnly: false, verb: 'returned to its author' },
  retire: { from: 'published', to: 'retired', minRole: 'curator', ownerOnly: false, verb: 'retired' },
};

/** Statuses in which a save is allowed, and by whom: owners edit drafts, curators anything not retired. */
export function editableBy(status: RecipeStatus, isOwner: boolean, isCurator: boolean): boolean {
  if (status === 'retired') return false;
  if (isCurator) return true;
  return isOwner && (status === 'draft' || status === 'in_review');
}
