import fs from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startServer, type RunningServer } from '../../support/server';
import { signInAs } from '../../support/session';
import { toCsv, type GeneratedTest } from '../../support/step-test-csv';

/**
 * The upload → fit path over HTTP. Step tests are generated from closed-form step responses with
 * seeded Gaussian noise (tests/support/step-test-csv.ts) and written as plant exports; the fitted
 * parameters must come back within the stated tolerances.
 */
const HTST: GeneratedTest = { model: { type: 'fopdt', k: 0.42, tau: 30, theta: 4 }, dt: 0.5, n: 400, stepAt: 20, u0: 40, u1: 45, y0: 71.8, sigma: 0.02, seed: 11 };
const LEVEL: GeneratedTest = { model: { type: 'ipdt', k: 0.004, theta: 6 }, dt: 1, n: 400, stepAt: 20, u0: 50, u1: 60, y0: 45, sigma: 0.05, seed: 5 };

describe('step tests over HTTP', () => {
  let server: RunningServer;
  let author: string;
  let reader: string;
  beforeAll(async () => {
    server = await startServer({ seed: true, env: { LOOPWRIGHT_SIGN_IN_MAX: '50' } });
    [author, reader] = [await signInAs(server.url, 'author'), await signInAs(server.url, 'reader')];
  });
  afterAll(async () => server?.stop());

  const form = (csv: string | Uint8Array, fields: Record<string, string> = {}, name = 'tic210.csv') => {
    const f = new FormData();
    f.set('file', new Blob([csv as BlobPart]), name);
    for (const [k, v] of Object.entries(fields)) f.set(k, v);
    return f;
  };
  const post = (url: string, cookie: string, body: FormData | string) =>
    fetch(`${server.url}${url}`, {
      method: 'POST',
      headers: { Cookie: cookie, Origin: server.url, ...(typeof body === 'string' ? { 'Content-Type': 'application/json' } : {}) },
      body,
    });
  const stored = () => {
    const dir = path.join(path.dirname(server.dbFile), 'step-tests');
    return fs.existsSync(dir) ? fs.readdirSync(dir) : [];
  };

  it('previews a file without storing it: format, first rows and a suggested mapping', async () => {
    const res = await post('/api/v1/step-tests/preview', author, form(toCsv(HTST, { european: true })));
    expect(res.status).toBe(200);
    const p = await res.json();
    expect(p).toMatchObject({ dialect: { delimiter: ';', decimal: ',' }, columns: 3, rowCount: 400, suggestedMapping: { time: { column: 1, unit: 's' }, co: { column: 3, unit: '%' } } });
    expect(p.rows).toHaveLength(20);
    expect(stored()).toEqual([]);
  });

  for (const [name, test, truth] of [['HTST outlet TIC-210 (FOPDT)', HTST, 'fopdt'], ['balance-tank level LIC-220 (IPDT)', LEVEL, 'ipdt']] as const) {
    it(`uploads and fits ${name}, recovering the generating parameters`, async () => {
      const mapping = JSON.stringify({ time: { column: 1, unit: 'timestamp' }, pv: { column: 2, unit: '°C' }, co: { column: 3, unit: '%' } });
      const up = await post('/api/v1/step-tests', author, form(toCsv(test, { timestamps: true }), { tag: truth === 'fopdt' ? 'TIC-210' : 'LIC-220', area: 'htst', mapping }));
      expect(up.status).toBe(201);
      const { stepTest, rowCount } = await up.json();
      expect(rowCount).toBe(test.n);
      const fit = await post(`/api/v1/step-tests/${stepTest.id}/fits`, author, '');
      expect(fit.status).toBe(201);
      const body = await fit.json();
      expect(body.fits.map((f: { type: string }) => f.type)).toEqual(['fopdt', 'sopdt', 'ipdt']);
      expect(body.plot.curves).toHaveLength(3);
      const m = body.fits.find((f: { type: string }) => f.type === truth).model;
      // Tolerances: 2 % on K (3 % for the integrator's slope), 4 % on τ, 0.5 s on θ (1.5 s for the integrator).
      expect(Math.abs(m.k / test.model.k - 1)).toBeLessThan(truth === 'fopdt' ? 0.02 : 0.03);
      expect(Math.abs(m.theta - test.model.theta)).toBeLessThan(truth === 'fopdt' ? 0.5 : 1.5);
      if (test.model.type === 'fopdt') expect(Math.abs(m.tau / test.model.tau - 1)).toBeLessThan(0.04);
      const again = await (await fetch(`${server.url}/api/v1/step-tests/${stepTest.id}`, { headers: { Cookie: author } })).json();
      expect(again.fits).toHaveLength(3);
    });
  }

  it('refuses a malformed file with every bad row by line and stores nothing', async () => {
    const before = stored().length;
    const lines = toCsv(HTST, { european: true }).split('\r\n');
    lines[5] = '2,000;71,8';
    lines[9] = '4,000;abc;40,000';
    const res = await post('/api/v1/step-tests', author, form(lines.join('\r\n'), { tag: 'TIC-210' }));
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error).toEqual({ code: 'invalid_file', message: 'Line 6: expected 3 cells, found 2 (1 more problem listed in issues).', field: 'file' });
    expect(body.issues.map((i: { message: string }) => i.message)).toEqual([
      'Line 6: expected 3 cells, found 2.',
      'Line 10, column 2 (TIC-210.PV): "abc" is not a number (this file uses decimal commas).',
    ]);
    expect(stored().length).toBe(before);
  });

  it('refuses binary content and a file over 5 MB, whatever they are called', async () => {
    const png = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    const bin = await post('/api/v1/step-tests', author, form(png, { tag: 'TIC-210' }, 'test.csv'));
    expect(bin.status).toBe(400);
    expect((await bin.json()).error.message).toBe('The file is not a CSV text file (it contains binary data): export the step test as CSV and upload that.');
    const big = await post('/api/v1/step-tests', author, form(new Uint8Array(5 * 1024 * 1024 + 10).fill(0x31), { tag: 'TIC-210' }));
    expect(big.status).toBe(413);
    expect((await big.json()).error).toMatchObject({ code: 'body_too_large', message: 'The file is 5.0 MB; a step-test file may be at most 5 MB.' });
  });

  it('answers 401 without a session and 403 for a reader, never 500 for bad input', async () => {
    expect((await fetch(`${server.url}/api/v1/step-tests`, { method: 'POST', headers: { Origin: server.url }, body: form('x') })).status).toBe(401);
    const r = await post('/api/v1/step-tests', reader, form(toCsv(HTST), { tag: 'TIC-210' }));
    expect(r.status).toBe(403);
    expect((await r.json()).error.code).toBe('forbidden');
    const noFile = await post('/api/v1/step-tests', author, 'not a form');
    expect(noFile.status).toBe(400);
    const missing = await fetch(`${server.url}/api/v1/step-tests/999999`, { headers: { Cookie: author } });
    expect(missing.status).toBe(404);
    const badFit = await post('/api/v1/step-tests/1/fits', author, '{"models":["arx"]}');
    expect(badFit.status).toBe(400);
    expect((await badFit.json()).error.field).toBe('models.0');
  });
});
