import { describe, expect, it } from 'vitest';
import { isPublicPath, isSessionFree, safeNext } from '../../../src/lib/auth/public-paths';

// Source: the product brief's list of what needs no session, and shared/api-v1.md ("The
// calculation routes need no session"; the OpenAPI document is public).
const PATHS: { path: string; open: boolean }[] = [
  { path: '/sign-in', open: true },
  { path: '/sign-in/', open: true },
  { path: '/forgot-password', open: true },
  { path: '/reset-password', open: true },
  { path: '/invite', open: true },
  { path: '/api/health', open: true },
  { path: '/api/auth/sign-in/email', open: true },
  { path: '/api/v1/calc/analyze', open: true },
  { path: '/api/v1/openapi.json', open: true },
  { path: '/_astro/client.Bx1.js', open: true },
  { path: '/favicon.svg', open: true },
  { path: '/', open: false },
  { path: '/recipes', open: false },
  { path: '/recipes/htst-hold-temperature', open: false },
  { path: '/admin/people', open: false },
  { path: '/api/v1/recipes', open: false },
  { path: '/api/v1/search', open: false },
  { path: '/api/admin/mail', open: false },
  { path: '/api/v1/recipes/x.json', open: false },
  { path: '/sign-in-elsewhere', open: false },
  { path: '/api/v1/calculate', open: false },
];

describe('isPublicPath', () => {
  for (const { path, open } of PATHS) {
    it(`${open ? 'opens' : 'guards'} ${path}`, () => expect(isPublicPath(path)).toBe(open));
  }
});

describe('isSessionFree', () => {
  it('covers the calculation routes and the API description only', () => {
    expect(isSessionFree('/api/v1/calc/tune')).toBe(true);
    expect(isSessionFree('/api/v1/openapi.json')).toBe(true);
    expect(isSessionFree('/api/v1/recipes')).toBe(false);
  });
});

describe('safeNext', () => {
  it('keeps a path on this site and replaces anything else with the home page', () => {
    expect(safeNext('/recipes?q=level')).toBe('/recipes?q=level');
    expect(safeNext('https://elsewhere.example/')).toBe('/');
    expect(safeNext('//elsewhere.example/')).toBe('/');
    expect(safeNext('/\\elsewhere.example')).toBe('/');
    expect(safeNext(null)).toBe('/');
  });
});
