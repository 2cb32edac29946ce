import { isMainThread, parentPort, workerData } from 'node:worker_threads';
import { compileBody, type CompileResult } from './compile';

/** Marks a worker started for authored bodies (this module is the worker's entry). */
export const WORKER_ROLE = 'loopwright-authored-mdx';

/** This module's own URL: the isolated compiler starts its workers on it. */
export const WORKER_URL = import.meta.url;

/** A request to the worker and its answer. */
export interface WorkerRequest { id: number; body: string }
export interface WorkerResponse { id: number; result: CompileResult }

if (!isMainThread && parentPort && (workerData as { role?: string } | null)?.role === WORKER_ROLE) {
  const port = parentPort;
  port.on('message', (req: WorkerRequest) => {
    let result: CompileResult;
    try {
      result = compileBody(req.body);
    } catch (err) {
      // Deep nesting can overflow the parser's stack; that is the body's fault, not the server's.
      const reason = err instanceof RangeError ? 'The body nests too deeply to read; flatten its lists or quotes.' : 'The body could not be read; simplify it and try again.';
      result = { ok: false, problems: [{ line: 1, column: 1, reason }] };
    }
    port.postMessage({ id: req.id, result } satisfies WorkerResponse);
  });
  // Loading the parser takes a while on a busy machine; the time budget starts only after this.
  port.postMessage({ ready: true });
}
