import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startServer, type RunningServer } from '../support/server';
import { signInAs } from '../support/session';
import pkg from '../../package.json';

describe('GET /api/health', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startServer({ seed: true });
  });
  afterAll(async () => server?.stop());

  it('answers 200 with the version once migrations have run at start', async () => {
    const res = await fetch(`${server.url}/api/health`);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body).toMatchObject({
      status: 'ok',
      version: pkg.version,
      database: { reachable: true, migrationsCurrent: true, pendingMigrations: [] },
    });
  });

  it('serves the home page with its three ways in', async () => {
    const cookie = await signInAs(server.url, 'reader');
    const html = await (await fetch(`${server.url}/`, { headers: { Cookie: cookie } })).text();
    expect(html).toContain('New to the plant?');
    expect(html).toContain('Keeping the book honest?');
  });
});

describe('GET /api/health with a database that cannot be opened', () => {
  let server: RunningServer;
  let dir: string;
  beforeAll(async () => {
    // A folder where the database file should be: SQLite cannot open it.
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'loopwright-broken-'));
    fs.mkdirSync(path.join(dir, 'db.sqlite'));
    server = await startServer({ env: { LOOPWRIGHT_DB: path.join(dir, 'db.sqlite') }, waitHealthy: false });
  });
  afterAll(async () => {
    await server?.stop();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('answers 503 and says the database is not reachable', async () => {
    const res = await fetch(`${server.url}/api/health`);
    expect(res.status).toBe(503);
    const body = await res.json();
    expect(body.status).toBe('unavailable');
    expect(body.database.reachable).toBe(false);
  });
});
