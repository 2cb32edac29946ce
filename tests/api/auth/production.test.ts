import { afterEach, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { startServer, type RunningServer } from '../../support/server';

const SETTINGS = {
  LOOPWRIGHT_MODE: 'production',
  BETTER_AUTH_SECRET: 'q'.repeat(48),
  BETTER_AUTH_URL: 'https://loopwright.brindlewood.example',
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: '2525',
  MAIL_FROM: 'Loopwright <loopwright@brindlewood.example>',
};

let server: RunningServer | undefined;
afterEach(async () => {
  await server?.stop();
  server = undefined;
});

async function statusAndMessage(url: string) {
  const res = await fetch(url, { redirect: 'manual' });
  return { status: res.status, message: (await res.json()).error?.message as string };
}

describe('production mode', () => {
  it('refuses every request, saying which setting is missing, without BETTER_AUTH_SECRET and BETTER_AUTH_URL', async () => {
    server = await startServer({ env: { LOOPWRIGHT_MODE: 'production' }, waitHealthy: false });
    for (const p of ['/api/health', '/sign-in', '/api/auth/get-session']) {
      await expect.poll(async () => (await fetch(`${server!.url}${p}`).catch(() => null))?.status ?? 0).toBe(503);
    }
    const { message } = await statusAndMessage(`${server.url}/sign-in`);
    expect(message).toMatch(/BETTER_AUTH_SECRET/);
    expect(message).toMatch(/BETTER_AUTH_URL/);
  });

  it('refuses to serve while a demo password still works', async () => {
    server = await startServer({ seed: true, env: SETTINGS, waitHealthy: false });
    await expect.poll(async () => (await fetch(`${server!.url}/api/health`).catch(() => null))?.status ?? 0).toBe(503);
    const { message } = await statusAndMessage(`${server.url}/`);
    expect(message).toMatch(/Demo accounts still open/);
    expect(message).toContain('tobiah.quarrie@brindlewood.example');
  });

  it('serves with its settings and no demo accounts', async () => {
    server = await startServer({ env: SETTINGS });
    expect((await fetch(`${server.url}/api/health`)).status).toBe(200);
    expect((await fetch(`${server.url}/`, { redirect: 'manual' })).status).toBe(302);
    const signIn = await (await fetch(`${server.url}/sign-in`)).text();
    expect(signIn).toContain('Sign in to the recipe book');
    expect(signIn).not.toContain('Demo accounts');
  });

  it('stops `prepare` (run by npm start) with the reason', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'loopwright-prod-'));
    try {
      const env = { ...process.env, LOOPWRIGHT_DB: path.join(dir, 'db.sqlite') };
      const seeded = spawnSync(process.execPath, ['--import', 'tsx', 'src/lib/db/cli.ts', 'seed'], { env, encoding: 'utf8' });
      expect(seeded.status).toBe(0);
      const r = spawnSync(process.execPath, ['--import', 'tsx', 'src/lib/db/cli.ts', 'prepare'], { env: { ...env, ...SETTINGS }, encoding: 'utf8' });
      expect(r.status).not.toBe(0);
      expect(r.stderr).toMatch(/refuses to start in production/);
      expect(r.stderr).toMatch(/Demo accounts still open/);
      const bare = spawnSync(process.execPath, ['--import', 'tsx', 'src/lib/db/cli.ts', 'prepare'], { env: { ...env, LOOPWRIGHT_MODE: 'production' }, encoding: 'utf8' });
      expect(bare.status).not.toBe(0);
      expect(bare.stderr).toMatch(/BETTER_AUTH_SECRET/);
    } finally {
      fs.rmSync(dir, { recursive: true, force: true });
    }
  });
});
