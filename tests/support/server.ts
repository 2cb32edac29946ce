import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

const ENTRY = path.resolve('dist/server/entry.mjs');

export interface RunningServer {
  /** Base URL, e.g. http://127.0.0.1:43117 */
  url: string;
  /** The temporary SQLite file this server uses. */
  dbFile: string;
  /** Everything the server printed so far (for failure messages). */
  output(): string;
  stop(): Promise<void>;
}

export interface ServerOptions {
  /** Load the demo data before starting. */
  seed?: boolean;
  /** Extra environment for the server process. */
  env?: Record<string, string>;
  /** Wait for /api/health to answer 200 (default true). */
  waitHealthy?: boolean;
}

/** Starts the built server on a free port with a fresh temporary database. */
export async function startServer(options: ServerOptions = {}): Promise<RunningServer> {
  if (!fs.existsSync(ENTRY)) {
    throw new Error(`No built server at ${ENTRY}: run \`npm run build\` first (npm test does it).`);
  }
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'loopwright-test-'));
  const dbFile = path.join(dir, 'loopwright.sqlite');
  const port = await freePort();
  const env = { ...process.env, LOOPWRIGHT_DB: dbFile, HOST: '127.0.0.1', PORT: String(port), ...options.env };
  if (options.seed) {
    const r = spawnSync(process.execPath, ['--import', 'tsx', 'src/lib/db/cli.ts', 'seed'], { env, encoding: 'utf8' });
    if (r.status !== 0) throw new Error(`Seeding failed: ${r.stderr || r.stdout}`);
  }
  const child = spawn(process.execPath, [ENTRY], { env, stdio: ['ignore', 'pipe', 'pipe'] });
  let log = '';
  child.stdout?.on('data', (d) => (log += d));
  child.stderr?.on('data', (d) => (log += d));
  const url = `http://127.0.0.1:${port}`;
  const server: RunningServer = { url, dbFile, output: () => log, stop: () => stop(child, dir) };
  try {
    await waitUntilUp(url, child, options.waitHealthy ?? true, () => log);
  } catch (err) {
    await server.stop();
    throw err;
  }
  return server;
}

async function waitUntilUp(url: string, child: ChildProcess, healthy: boolean, log: () => string) {
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`Server exited with ${child.exitCode}:\n${log()}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (!healthy || res.status === 200) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`Server did not become ready within 30 s:\n${log()}`);
}

async function stop(child: ChildProcess, dir: string): Promise<void> {
  if (child.exitCode === null) {
    const exited = new Promise((r) => child.once('exit', r));
    child.kill('SIGTERM');
    await Promise.race([exited, new Promise((r) => setTimeout(r, 3000))]);
    if (child.exitCode === null) child.kill('SIGKILL');
  }
  fs.rmSync(dir, { recursive: true, force: true });
}

/** A TCP port that was free a moment ago. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}
