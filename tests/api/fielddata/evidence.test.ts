import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { sessionHeaders, signInAs } from '../../support/session';
import { toCsv } from '../../support/step-test-csv';

const RECIPE = 'htst-product-temperature-cascade';
const tuning = { rule: 'simc', source: 'Skogestad (2003)', setting: { form: 'ideal', gain: 2.1, integral: 0.6, derivative: null, timeUnit: 'min', gainUnit: '%/°C' } };

describe('evidence over HTTP', () => {
  let server: RunningServer;
  let author: string;
  let reader: string;
  let stepTestId: number;
  let fitId: number;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    [author, reader] = [await signInAs(server.url, 'author'), await signInAs(server.url, 'reader')];
    const f = new FormData();
    f.set('file', new Blob([toCsv({ model: { type: 'fopdt', k: 0.9, tau: 22, theta: 7 }, dt: 1, n: 300, stepAt: 20, u0: 40, u1: 44, y0: 72.4, sigma: 0.03, seed: 8 })]), 'tic210.csv');
    f.set('tag', 'TIC-210');
    f.set('area', 'htst');
    const up = await (await fetch(`${server.url}/api/v1/step-tests`, { method: 'POST', headers: { Cookie: author, Origin: server.url }, body: f })).json();
    stepTestId = up.stepTest.id;
    const fits = await (await fetch(`${server.url}/api/v1/step-tests/${stepTestId}/fits`, { method: 'POST', headers: sessionHeaders(server.url, author), body: '{"models":["fopdt"]}' })).json();
    fitId = fits.fits[0].id;
    expect(fits.fits[0].matches.map((m: { slug: string }) => m.slug)).toContain(RECIPE);
  });
  afterAll(async () => server?.stop());

  const save = (cookie: string, body: unknown) =>
    fetch(`${server.url}/api/v1/evidence`, { method: 'POST', headers: sessionHeaders(server.url, cookie), body: JSON.stringify(body) });

  it('saves evidence for a file recipe, lists it, and shows it with the following loops on the recipe page', async () => {
    expect((await save(reader, { stepTestId, fitId, tuning, recipeSlug: RECIPE })).status).toBe(403);
    const res = await save(author, { stepTestId, fitId, tuning, recipeSlug: RECIPE, loopTags: ['TIC-210'], note: 'After the plate pack was reworked' });
    expect(res.status).toBe(201);
    const { evidence, recipe } = await res.json();
    expect(recipe).toMatchObject({ slug: RECIPE, url: `/recipes/${RECIPE}` });
    expect(evidence).toMatchObject({ recipeSlug: RECIPE, tag: 'TIC-210', model: { type: 'fopdt' } });
    const list = await (await fetch(`${server.url}/api/v1/evidence?recipe=${RECIPE}`, { headers: { Cookie: reader } })).json();
    expect(list.evidence.map((e: { id: number }) => e.id)).toEqual([evidence.id]);
    const loop = await (await fetch(`${server.url}/api/v1/loops/TIC-210`, { headers: { Cookie: reader } })).json();
    expect(loop.evidence.map((e: { id: number }) => e.id)).toEqual([evidence.id]);
    const html = await (await fetch(`${server.url}/recipes/${RECIPE}`, { headers: { Cookie: reader } })).text();
    expect(html).toContain('data-testid="evidence-item"');
    expect(html).toContain('After the plate pack was reworked');
    expect(html).toMatch(/<path d="M[\d. ]+L/);
    expect(html).toContain('href="/loops/TIC-210"');
  });

  it('starts a new draft recipe from the evidence through the editorial flow', async () => {
    const res = await save(author, { stepTestId, fitId, tuning, newDraft: { title: 'TIC-210 after the plate rework', summary: 'Outlet temperature of the HTST after the plate pack was reworked.', loopType: 'temperature' } });
    expect(res.status).toBe(201);
    const body = await res.json();
    expect(body).toMatchObject({ createdDraft: true, recipe: { slug: 'tic-210-after-the-plate-rework', status: 'draft' } });
  });

  it('refuses evidence that names no recipe, or a recipe that does not exist, with the field', async () => {
    const none = await save(author, { stepTestId, fitId, tuning });
    expect(none.status).toBe(400);
    expect((await none.json()).error).toEqual({ code: 'invalid_request', message: 'Check recipeSlug: Give either recipeSlug (an existing recipe) or newDraft (a new draft recipe), not both.', field: 'recipeSlug' });
    const retired = await save(author, { stepTestId, fitId, tuning, recipeSlug: 'htst-product-temperature-single-loop' });
    expect(retired.status).toBe(409);
    expect((await retired.json()).error.code).toBe('recipe_retired');
    const unknown = await save(author, { stepTestId, fitId, tuning, recipeSlug: 'no-such-recipe' });
    expect((await unknown.json()).error).toEqual({ code: 'invalid_request', message: 'There is no recipe "no-such-recipe" that you can see.', field: 'recipeSlug' });
  });
});
