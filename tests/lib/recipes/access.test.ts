import { describe, expect, it } from 'vitest';
import { canSee, viewerOf } from '../../../src/lib/recipes/access';
import { makeRecord } from './make-record';

// The contract (shared/api-v1.md, "Recipes and accounts"): drafts and recipes in review are seen
// by their author and by curators and admins only; published and retired ones by anyone signed in.
const owner = 'owner@brindlewood.example';
const cases = [
  { status: 'published', viewer: { email: 'someone@brindlewood.example', role: 'reader' }, sees: true },
  { status: 'retired', viewer: { email: 'someone@brindlewood.example', role: 'reader' }, sees: true },
  { status: 'draft', viewer: { email: 'someone@brindlewood.example', role: 'reader' }, sees: false },
  { status: 'draft', viewer: { email: 'someone@brindlewood.example', role: 'author' }, sees: false },
  { status: 'draft', viewer: { email: 'OWNER@brindlewood.example', role: 'author' }, sees: true },
  { status: 'in_review', viewer: { email: 'someone@brindlewood.example', role: 'curator' }, sees: true },
  { status: 'in_review', viewer: { email: 'someone@brindlewood.example', role: 'admin' }, sees: true },
  { status: 'in_review', viewer: null, sees: false },
] as const;

describe('canSee', () => {
  it.each(cases)('a $viewer.role sees a $status recipe: $sees', ({ status, viewer, sees }) => {
    const record = makeRecord('x', { status, owner: { name: 'Owner', email: owner }, ...(status === 'retired' ? { retiredReason: 'Replaced.' } : {}) });
    expect(canSee(viewer, record)).toBe(sees);
  });
});

describe('viewerOf', () => {
  it('requires sign-in once the middleware sets locals.user, and reads the viewer from it', () => {
    expect(viewerOf({ user: null })).toEqual({ viewer: null, signInRequired: true });
    expect(viewerOf({ user: { email: 'a@b.example', role: 'curator', id: '1', name: 'A' } }).viewer).toEqual({ email: 'a@b.example', role: 'curator' });
  });
});
