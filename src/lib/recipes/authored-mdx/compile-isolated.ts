import { createRequire } from 'node:module';
import { pathToFileURL } from 'node:url';
import { Worker } from 'node:worker_threads';
import type { CompileResult } from './compile';
import { BODY_LIMITS } from './limits';
import type { WorkerRequest, WorkerResponse } from './compile-worker';

interface Pending { resolve(result: CompileResult): void; timer: NodeJS.Timeout }

let worker: Promise<Worker> | null = null;
let current: Worker | null = null;
let nextId = 1;
const pending = new Map<number, Pending>();
/** Bodies wait here so that only one compiles at a time and a timeout blames the right one. */
let queue: Promise<unknown> = Promise.resolve();

/** Starts a worker and resolves once it has loaded the compiler (or fails if it cannot). */
async function startWorker(): Promise<Worker> {
  // Imported lazily so the bundler gives the worker module a chunk of its own to start on.
  const { WORKER_URL, WORKER_ROLE } = await import('./compile-worker');
  const options = { workerData: { role: WORKER_ROLE }, resourceLimits: { maxOldGenerationSizeMb: 256, stackSizeMb: 8 } };
  const w = WORKER_URL.endsWith('.ts')
    ? new Worker(typeScriptEntry(WORKER_URL), { ...options, eval: true })
    : new Worker(new URL(WORKER_URL), options);
  w.unref();
  current = w;
  const ready = new Promise<void>((resolve, reject) => {
    w.once('error', reject);
    w.once('exit', () => reject(new Error('The compile worker stopped while starting.')));
    w.on('message', (msg: WorkerResponse | { ready: true }) => ('ready' in msg ? resolve() : settle(msg.id, msg.result)));
  });
  // A worker that was replaced after a timeout has nothing pending any more; only the current one's
  // crash fails the waiting body.
  const crashed = () => {
    if (current !== w) return;
    current = null;
    worker = null;
    failAll('The body could not be compiled; simplify it and try again.');
  };
  w.on('error', crashed);
  w.on('exit', crashed);
  await ready;
  return w;
}

/**
 * Source files (tests, CLI) need the TypeScript loader inside the worker too, and Node 20 does
 * not pass `--import` hooks on to workers; the built server starts plain JavaScript instead.
 */
function typeScriptEntry(entryUrl: string): string {
  // require.resolve finds tsx's CommonJS build; its ES module build sits beside it.
  const loader = pathToFileURL(createRequire(entryUrl).resolve('tsx/esm/api').replace(/\.cjs$/, '.mjs')).href;
  return `(async () => { (await import(${JSON.stringify(loader)})).register(); await import(${JSON.stringify(entryUrl)}); })();`;
}

function settle(id: number, result: CompileResult) {
  const p = pending.get(id);
  if (!p) return;
  clearTimeout(p.timer);
  pending.delete(id);
  p.resolve(result);
}

function failAll(reason: string) {
  for (const id of [...pending.keys()]) settle(id, { ok: false, problems: [{ line: 1, column: 1, reason }] });
}

/**
 * Compiles an authored body in a worker thread with a hard timeout: a body that stalls the
 * parser is refused and its worker terminated, and the next body gets a fresh worker.
 */
export function compileBodyIsolated(body: string, timeoutMs: number = BODY_LIMITS.compileTimeoutMs): Promise<CompileResult> {
  const run = queue.then(() => compileOnce(body, timeoutMs));
  queue = run.catch(() => undefined);
  return run;
}

async function compileOnce(body: string, timeoutMs: number): Promise<CompileResult> {
  worker ??= startWorker();
  let w: Worker;
  try {
    w = await worker;
  } catch {
    worker = null;
    return { ok: false, problems: [{ line: 1, column: 1, reason: 'The body could not be compiled right now; try again in a moment.' }] };
  }
  const id = nextId++;
  return new Promise<CompileResult>((resolve) => {
    const timer = setTimeout(() => {
      pending.delete(id);
      worker = null;
      current = null;
      void w.terminate();
      resolve({ ok: false, problems: [{ line: 1, column: 1, reason: `The body took longer than ${timeoutMs / 1000} s to read; it may hold a long run of * or _ or deep nesting — simplify it.` }] });
    }, timeoutMs);
    pending.set(id, { resolve, timer });
    w.postMessage({ id, body } satisfies WorkerRequest);
  });
}

/** Stops the worker (tests and shutdown). */
export async function stopCompileWorker(): Promise<void> {
  const w = current;
  worker = null;
  current = null;
  if (w) await w.terminate();
}
