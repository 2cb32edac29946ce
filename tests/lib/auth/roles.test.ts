import { describe, expect, it } from 'vitest';
import { hasRole, roleRank, ROLES, type Role } from '../../../src/lib/auth/roles';

// Source: the product's role order (shared/api-v1.md, "Recipes and accounts"): reader < author < curator < admin.
const TABLE: { role: string | null; min: Role; expected: boolean }[] = [
  { role: 'reader', min: 'reader', expected: true },
  { role: 'reader', min: 'author', expected: false },
  { role: 'author', min: 'reader', expected: true },
  { role: 'author', min: 'curator', expected: false },
  { role: 'curator', min: 'author', expected: true },
  { role: 'curator', min: 'admin', expected: false },
  { role: 'admin', min: 'curator', expected: true },
  { role: 'admin', min: 'admin', expected: true },
  { role: 'owner', min: 'reader', expected: false },
  { role: null, min: 'reader', expected: false },
];

describe('hasRole', () => {
  for (const row of TABLE) {
    it(`${row.role ?? 'no role'} ${row.expected ? 'may' : 'may not'} act as ${row.min}`, () => {
      expect(hasRole({ role: row.role }, row.min)).toBe(row.expected);
    });
  }

  it('says no for a signed-out visitor', () => {
    expect(hasRole(null, 'reader')).toBe(false);
    expect(hasRole(undefined, 'reader')).toBe(false);
  });
});

describe('roleRank', () => {
  it('orders the roles as the contract lists them', () => {
    expect(ROLES.map(roleRank)).toEqual([0, 1, 2, 3]);
    expect(roleRank('superuser')).toBe(-1);
  });
});
