import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../support/server';
import { readRecipeFiles } from '../../src/lib/recipes/file-reader';
import { signInAs } from '../support/session';
import { responseValidator } from '../support/openapi-validator';

const files = readRecipeFiles();
const published = files.filter((r) => r.data.status === 'published');
const retired = files.filter((r) => r.data.status === 'retired');

describe('GET /api/v1/recipes', () => {
  let server: RunningServer;
  let cookie: string;
  const get = (path: string) => fetch(`${server.url}${path}`, { headers: { Cookie: cookie } });
  beforeAll(async () => {
    server = await startServer({ seed: true });
    cookie = await signInAs(server.url, 'reader');
  });

  it('answers 401 unauthenticated without a session', async () => {
    for (const path of ['/api/v1/recipes', '/api/v1/recipes/raw-milk-reception-flow', '/api/v1/search?q=flow']) {
      const res = await fetch(`${server.url}${path}`);
      expect(res.status, path).toBe(401);
      expect((await res.json()).error.code).toBe('unauthenticated');
    }
    const page = await fetch(`${server.url}/recipes/raw-milk-reception-flow`, { redirect: 'manual' });
    expect(page.status).toBe(302);
    expect(page.headers.get('location')).toMatch(/^\/sign-in\?next=/);
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('lists the published file recipes only, in the contract shape', async () => {
    const res = await get('/api/v1/recipes');
    expect(res.status).toBe(200);
    const { recipes } = await res.json();
    expect(recipes.map((r: { slug: string }) => r.slug).sort()).toEqual(published.map((r) => r.slug).sort());
    for (const r of recipes) {
      expect(r).toMatchObject({ source: 'file', status: 'published', rating: { average: null, count: 0 }, url: `/recipes/${r.slug}` });
      for (const key of ['slug', 'title', 'summary', 'loopType', 'revision', 'body', 'model', 'controller', 'claims', 'ownerEmail', 'updatedAt']) {
        expect(r, key).toHaveProperty(key);
      }
      expect(Number.isInteger(r.revision)).toBe(true);
      expect(r).not.toHaveProperty('retiredReason');
    }
  });

  it('lists retired recipes with status=retired, each with its reason and successor', async () => {
    const { recipes } = await (await get('/api/v1/recipes?status=retired')).json();
    expect(recipes.map((r: { slug: string }) => r.slug).sort()).toEqual(retired.map((r) => r.slug).sort());
    expect(recipes.length).toBeGreaterThanOrEqual(2);
    for (const r of recipes) {
      expect(typeof r.retiredReason).toBe('string');
      expect(published.map((p) => p.slug)).toContain(r.supersededBy);
    }
  });

  it('filters by loop type and by words', async () => {
    const { recipes: levels } = await (await get('/api/v1/recipes?loopType=level')).json();
    expect(levels.length).toBeGreaterThan(0);
    expect(levels.every((r: { loopType: string }) => r.loopType === 'level')).toBe(true);
    const { recipes: found } = await (await get('/api/v1/recipes?q=shrink%20swell')).json();
    expect(found[0]?.slug).toBe('boiler-drum-level-inverse-response');
  });

  it('answers a bad filter with 400 naming the parameter', async () => {
    const res = await get('/api/v1/recipes?loopType=viscosity');
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error).toMatchObject({ code: 'invalid_request', field: 'loopType' });
    expect(body.error.message).toMatch(/loopType/);
  });

  it('gives one recipe by slug, and 404 with a message for an unknown one', async () => {
    const slug = 'htst-product-temperature-cascade';
    const res = await get(`/api/v1/recipes/${slug}`);
    expect(res.status).toBe(200);
    const r = await res.json();
    expect(r).toMatchObject({ slug, loopType: 'temperature', structure: 'cascade', source: 'file' });
    expect(r.innerLoop.loopTag).toBe('TIC-211');
    const missing = await get('/api/v1/recipes/no-such-recipe');
    expect(missing.status).toBe(404);
    expect((await missing.json()).error.code).toBe('not_found');
  });
});

describe('GET /api/v1/search', () => {
  let server: RunningServer;
  let cookie: string;
  const get = (path: string) => fetch(`${server.url}${path}`, { headers: { Cookie: cookie } });
  beforeAll(async () => {
    server = await startServer({ seed: true });
    cookie = await signInAs(server.url, 'reader');
  });
  afterAll(async () => {
    await server?.stop();
  });

  it('finds a recipe by a misspelled word, best first, published only', async () => {
    const res = await get('/api/v1/search?q=pasturizer%20cascde');
    expect(res.status).toBe(200);
    const { hits } = await res.json();
    expect(hits[0]).toMatchObject({ slug: 'htst-product-temperature-cascade' });
    expect(typeof hits[0].score).toBe('number');
    const scores = hits.map((h: { score: number }) => h.score);
    expect(scores).toEqual([...scores].sort((a, b) => b - a));
    expect(hits.map((h: { slug: string }) => h.slug)).not.toContain('htst-product-temperature-single-loop');
  });

  it('answers in the shape the OpenAPI document gives for GET /api/v1/search', async () => {
    const validate = responseValidator();
    for (const q of ['flow', 'pasturizer', 'zzzz-nothing']) {
      const body = await (await get(`/api/v1/search?q=${encodeURIComponent(q)}`)).json();
      expect(validate('/api/v1/search', 'get', body), q).toBeNull();
    }
    expect(validate('/api/v1/search', 'get', { hits: [{ slug: 'a', title: 'A' }] })).not.toBeNull();
  });

  it('answers list and single reads, published and retired, in the shape the OpenAPI document gives', async () => {
    const validate = responseValidator();
    for (const path of ['/api/v1/recipes', '/api/v1/recipes?status=retired']) {
      const body = await (await get(path)).json();
      expect(body.recipes.length, path).toBeGreaterThan(0);
      expect(validate('/api/v1/recipes', 'get', body), path).toBeNull();
    }
    for (const slug of [published[0].slug, retired[0].slug]) {
      const body = await (await get(`/api/v1/recipes/${slug}`)).json();
      expect(validate('/api/v1/recipes/{slug}', 'get', body), slug).toBeNull();
    }
    expect(validate('/api/v1/recipes/{slug}', 'get', { slug: 'x' })).not.toBeNull();
  });

  it('answers a missing q with 400 invalid_request', async () => {
    const res = await get('/api/v1/search');
    expect(res.status).toBe(400);
    expect((await res.json()).error).toMatchObject({ code: 'invalid_request', field: 'q' });
  });
});
