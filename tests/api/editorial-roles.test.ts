import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../support/server';
import { callers, sampleRecipe, type Caller } from '../support/editorial';

type Who = 'anonymous' | 'reader' | 'author' | 'curator' | 'admin';
type Setup = 'draft' | 'in_review' | 'published' | 'none';

/**
 * Every editorial route as each role. Each row names the state the recipe must be in before
 * the call (a fresh recipe is made by the demo author for every cell, so cells do not
 * interfere) and the status each role must get. File recipe: `raw-milk` stands for any file slug.
 */
const MATRIX: { route: string; method: string; path: (slug: string) => string; setup: Setup; body?: (slug: string) => unknown; expect: Record<Who, number> }[] = [
  { route: 'create', method: 'POST', path: () => '/api/v1/recipes', setup: 'none', body: () => sampleRecipe('Boiler feedwater level'), expect: { anonymous: 401, reader: 403, author: 201, curator: 201, admin: 201 } },
  { route: 'save own draft', method: 'PUT', path: (s) => `/api/v1/recipes/${s}`, setup: 'draft', body: () => ({ baseRevision: 1, summary: 'Tightened after the March step test on the caustic wash.' }), expect: { anonymous: 401, reader: 403, author: 200, curator: 200, admin: 200 } },
  { route: 'list recipes', method: 'GET', path: () => '/api/v1/recipes', setup: 'none', expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'search', method: 'GET', path: () => '/api/v1/search?q=temperature', setup: 'none', expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'read a published recipe', method: 'GET', path: (s) => `/api/v1/recipes/${s}`, setup: 'published', expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'read a draft', method: 'GET', path: (s) => `/api/v1/recipes/${s}`, setup: 'draft', expect: { anonymous: 401, reader: 404, author: 200, curator: 200, admin: 200 } },
  { route: 'submit', method: 'POST', path: (s) => `/api/v1/recipes/${s}/submit`, setup: 'draft', expect: { anonymous: 401, reader: 403, author: 200, curator: 403, admin: 403 } },
  { route: 'publish', method: 'POST', path: (s) => `/api/v1/recipes/${s}/publish`, setup: 'in_review', expect: { anonymous: 401, reader: 403, author: 403, curator: 200, admin: 200 } },
  { route: 'return', method: 'POST', path: (s) => `/api/v1/recipes/${s}/return`, setup: 'in_review', body: () => ({ comment: 'Name the valve and its size.' }), expect: { anonymous: 401, reader: 403, author: 403, curator: 200, admin: 200 } },
  { route: 'retire', method: 'POST', path: (s) => `/api/v1/recipes/${s}/retire`, setup: 'published', body: () => ({ reason: 'The heat exchanger was replaced.' }), expect: { anonymous: 401, reader: 403, author: 403, curator: 200, admin: 200 } },
  { route: 'publish a draft (wrong status)', method: 'POST', path: (s) => `/api/v1/recipes/${s}/publish`, setup: 'draft', expect: { anonymous: 401, reader: 403, author: 403, curator: 409, admin: 409 } },
  { route: 'rate', method: 'PUT', path: (s) => `/api/v1/recipes/${s}/rating`, setup: 'published', body: () => ({ stars: 4, note: 'Used on TIC-541 as written.' }), expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'field notes', method: 'GET', path: (s) => `/api/v1/recipes/${s}/notes`, setup: 'published', expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'watch', method: 'PUT', path: (s) => `/api/v1/recipes/${s}/watch`, setup: 'published', expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'unwatch', method: 'DELETE', path: (s) => `/api/v1/recipes/${s}/watch`, setup: 'published', expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'revisions of a draft', method: 'GET', path: (s) => `/api/v1/recipes/${s}/revisions`, setup: 'draft', expect: { anonymous: 401, reader: 404, author: 200, curator: 200, admin: 200 } },
  { route: 'diff of a published recipe', method: 'GET', path: (s) => `/api/v1/recipes/${s}/diff?from=1&to=1`, setup: 'published', expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'templates', method: 'GET', path: () => '/api/v1/templates', setup: 'none', expect: { anonymous: 401, reader: 200, author: 200, curator: 200, admin: 200 } },
  { route: 'change a template', method: 'PUT', path: () => '/api/v1/templates/flow', setup: 'none', body: () => ({ title: 'Flow loop recipe', body: '## When to use it\n\nFast loops.\n' }), expect: { anonymous: 401, reader: 403, author: 403, curator: 200, admin: 200 } },
  { route: 'review queue', method: 'GET', path: () => '/api/v1/review-queue', setup: 'none', expect: { anonymous: 401, reader: 403, author: 403, curator: 200, admin: 200 } },
  { route: 'audit log', method: 'GET', path: () => '/api/v1/audit-log', setup: 'none', expect: { anonymous: 401, reader: 403, author: 403, curator: 403, admin: 200 } },
  { route: 'preview', method: 'POST', path: () => '/api/v1/preview', setup: 'none', body: () => ({ body: '# Hello' }), expect: { anonymous: 401, reader: 403, author: 200, curator: 200, admin: 200 } },
];

const WHO: Who[] = ['anonymous', 'reader', 'author', 'curator', 'admin'];

describe('editorial routes by role', () => {
  let server: RunningServer;
  let as: Record<Who, Caller>;
  let fileSlug: string;
  let n = 0;

  async function recipeIn(state: Setup): Promise<string> {
    if (state === 'none') return '';
    const created = await as.author.call('POST', '/api/v1/recipes', sampleRecipe(`CIP return temperature ${++n}`));
    expect(created.status).toBe(201);
    const slug = created.body.slug as string;
    if (state === 'draft') return slug;
    expect((await as.author.call('POST', `/api/v1/recipes/${slug}/submit`)).status).toBe(200);
    if (state === 'in_review') return slug;
    expect((await as.curator.call('POST', `/api/v1/recipes/${slug}/publish`)).status).toBe(200);
    return slug;
  }

  beforeAll(async () => {
    server = await startServer({ seed: true });
    as = await callers(server.url);
    const list = await as.reader.call('GET', '/api/v1/recipes');
    fileSlug = (list.body.recipes as { slug: string; source: string }[]).find((r) => r.source === 'file')!.slug;
  }, 120_000);
  afterAll(async () => server?.stop());

  for (const row of MATRIX) {
    it.each(WHO)(`${row.route}: %s`, async (who) => {
      const slug = await recipeIn(row.setup);
      const res = await as[who].call(row.method, row.path(slug), row.body?.(slug));
      expect(res.status, JSON.stringify(res.body)).toBe(row.expect[who]);
      if (res.status >= 400) expect(res.body.error.message.length).toBeGreaterThan(10);
    });
  }

  it.each(['author', 'curator', 'admin'] as const)('answers 409 read_only to %s writing to a file recipe', async (who) => {
    for (const [method, path, body] of [
      ['PUT', `/api/v1/recipes/${fileSlug}`, { baseRevision: 1, title: 'Changed' }],
      ['POST', `/api/v1/recipes/${fileSlug}/submit`, undefined],
      ['POST', `/api/v1/recipes/${fileSlug}/retire`, { reason: 'Old' }],
    ] as const) {
      const res = await as[who].call(method, path, body);
      // Authors may not retire anything (403 comes before looking at the recipe); every other write is read_only.
      if (who === 'author' && path.endsWith('/retire')) expect(res.status).toBe(403);
      else expect(res.body.error?.code, `${method} ${path}`).toBe('read_only');
    }
  });

  it('rates a file recipe too', async () => {
    const res = await as.reader.call('PUT', `/api/v1/recipes/${fileSlug}/rating`, { stars: 5 });
    expect(res).toMatchObject({ status: 200, body: { rating: { count: 1, average: 5 } } });
  });
});
