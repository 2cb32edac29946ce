import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { sessionHeaders, signInAs } from '../../support/session';

describe('loop register over HTTP', () => {
  let server: RunningServer;
  const who: Record<string, string> = {};
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    for (const role of ['reader', 'author', 'curator'] as const) who[role] = await signInAs(server.url, role);
  });
  afterAll(async () => server?.stop());

  const call = (method: string, url: string, role: string | null, body?: unknown) =>
    fetch(`${server.url}${url}`, {
      method,
      headers: role ? sessionHeaders(server.url, who[role]) : { 'Content-Type': 'application/json', Origin: server.url },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  const loop = { tag: 'TIC-640', area: 'glycol', description: 'Glycol supply to silo jackets', ownerEmail: 'hanne.vos@brindlewood.example', commissionedAt: '2026-03-01', tuning: { form: 'series', gain: 2.4, integral: 3, derivative: 0.5, timeUnit: 'min', gainUnit: '%/%' } };

  it('lists the demo register and filters by area, recipe and age of tuning', async () => {
    const all = (await (await call('GET', '/api/v1/loops', 'reader')).json()).loops;
    expect(all.length).toBeGreaterThanOrEqual(8);
    const htst = (await (await call('GET', '/api/v1/loops?area=htst', 'reader')).json()).loops.map((l: { tag: string }) => l.tag);
    expect(htst).toEqual(['LIC-220', 'TIC-210', 'TIC-250']);
    const following = (await (await call('GET', '/api/v1/loops?recipe=raw-milk-reception-flow', 'reader')).json()).loops.map((l: { tag: string }) => l.tag);
    expect(following).toEqual(['FIC-101', 'FIC-102']);
    const old = (await (await call('GET', '/api/v1/loops?tunedBefore=2022-01-01', 'reader')).json()).loops.map((l: { tag: string }) => l.tag);
    expect(old).toEqual(['TIC-130']);
    const bad = await call('GET', '/api/v1/loops?tunedBefore=yesterday', 'reader');
    expect(bad.status).toBe(400);
    expect((await bad.json()).error).toEqual({ code: 'invalid_request', message: 'Check tunedBefore: Use a date written YYYY-MM-DD.', field: 'tunedBefore' });
  });

  it('lets authors register and change loops, curators remove them, and readers only read', async () => {
    expect((await call('POST', '/api/v1/loops', null, loop)).status).toBe(401);
    expect((await call('POST', '/api/v1/loops', 'reader', loop)).status).toBe(403);
    const created = await call('POST', '/api/v1/loops', 'author', loop);
    expect(created.status).toBe(201);
    expect(await created.json()).toMatchObject({ tag: 'TIC-640', tuning: { form: 'series', timeUnit: 'min' } });
    const dup = await call('POST', '/api/v1/loops', 'author', loop);
    expect(dup.status).toBe(409);
    const changed = await call('PUT', '/api/v1/loops/tic-640', 'author', { ...loop, description: 'Glycol supply, after the pump swap' });
    expect((await changed.json()).description).toBe('Glycol supply, after the pump swap');
    expect((await call('DELETE', '/api/v1/loops/TIC-640', 'author')).status).toBe(403);
    expect((await call('DELETE', '/api/v1/loops/TIC-640', 'curator')).status).toBe(204);
    expect((await call('GET', '/api/v1/loops/TIC-640', 'reader')).status).toBe(404);
  });

  it('answers 400 with the field for a bad loop and never writes half a record', async () => {
    const r = await call('POST', '/api/v1/loops', 'author', { ...loop, tag: 'TIC-641', tuning: { ...loop.tuning, integral: -1 } });
    expect(r.status).toBe(400);
    expect((await r.json()).error).toEqual({ code: 'invalid_request', message: 'Check tuning.integral: The integral setting cannot be negative.', field: 'tuning.integral' });
    const broken = await fetch(`${server.url}/api/v1/loops`, { method: 'POST', headers: sessionHeaders(server.url, who.author), body: '{"tag":' });
    expect(broken.status).toBe(400);
    expect((await broken.json()).error.code).toBe('invalid_json');
    expect((await call('GET', '/api/v1/loops/TIC-641', 'reader')).status).toBe(404);
  });

  it('exports the register as CSV and imports it back (curators), all rows or none', async () => {
    const csv = await (await fetch(`${server.url}/api/v1/loops/export.csv?area=htst`, { headers: { Cookie: who.reader } })).text();
    expect(csv.split('\r\n')[0]).toBe('tag,area,description,recipe,form,gain,integral,derivative,time_unit,gain_unit,commissioned_by,commissioned_at,owner_email');
    expect(csv.split('\r\n').filter(Boolean)).toHaveLength(4);
    const changed = csv.replace('HTST balance tank level', 'HTST balance tank level (new transmitter)');
    const send = (role: string, text: string) =>
      fetch(`${server.url}/api/v1/loops/import`, { method: 'POST', headers: { Cookie: who[role], Origin: server.url, 'Content-Type': 'text/csv' }, body: text });
    expect((await send('author', changed)).status).toBe(403);
    const ok = await send('curator', changed);
    expect(await ok.json()).toEqual({ created: [], updated: ['LIC-220', 'TIC-210', 'TIC-250'] });
    const bad = await send('curator', `${changed}XIC-1,htst,,,,,,,,,,,nobody@brindlewood.example\r\n`);
    expect(bad.status).toBe(400);
    const body = await bad.json();
    expect(body.issues[0].message).toBe('Line 5, column 1 (tag): A loop tag is 2–5 letters, a hyphen and 2–5 digits, e.g. TIC-210 or FIC-101A.');
  });
});
