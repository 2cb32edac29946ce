/**
 * Engine benchmark: one full analysis of a loop with a 4th-order plant with dead time and a
 * filtered ideal PID (1001-point closed-loop step, 200-point frequency response, margins, Ms),
 * plus the gzip size of the engine as a minified client bundle. The timings run that same
 * bundle, as the islands and the server build ship it (running the TypeScript through tsx adds
 * a naming wrapper to every closure it creates, which is not in any build).
 */
import { gzipSync } from 'node:zlib';
import { loadavg, tmpdir } from 'node:os';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { build } from 'esbuild';
import type { AnalyzeRequest, AnalyzeResponse } from '../../src/lib/control/index';

/** Brindlewood Creamery, HTST hot-water set TIC-210: four lags and transport delay (fictional). */
export const benchRequest: AnalyzeRequest = {
  plant: [
    { num: [1.8], den: [24, 1], delay: 3.5 },
    { num: [1], den: [6, 1] },
    { num: [1], den: [2, 1] },
    { num: [1], den: [0.8, 1] },
  ],
  controller: { form: 'ideal', kc: 1.1, ti: 26, td: 4, n: 10 },
  analyses: { step: { points: 1001 }, frequency: { points: 200 }, margins: true },
};

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

type Analyze = (req: AnalyzeRequest) => AnalyzeResponse;

/** The engine as a minified client bundle: its size, and its analyze() loaded from it. */
async function engineBundle(): Promise<{ raw: number; gzip: number; analyze: Analyze }> {
  const entry = fileURLToPath(new URL('../../src/lib/control/index.ts', import.meta.url));
  const out = await build({ entryPoints: [entry], bundle: true, minify: true, format: 'esm', write: false, platform: 'browser' });
  const code = out.outputFiles[0].contents;
  const dir = mkdtempSync(path.join(tmpdir(), 'loopwright-engine-bench-'));
  try {
    const file = path.join(dir, 'engine.mjs');
    writeFileSync(file, code);
    const mod = (await import(pathToFileURL(file).href)) as { analyze: Analyze };
    return { raw: code.length, gzip: gzipSync(code, { level: 9 }).length, analyze: mod.analyze };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** A fixed scalar workload (10⁷ dependent additions) to put the figures in context on a busy machine. */
function referenceLoopMs(): number {
  const a = new Float64Array(1000).fill(1.0001);
  let s = 0;
  const t0 = performance.now();
  for (let r = 0; r < 10000; r++) for (let i = 0; i < 1000; i++) s += a[i] * 1e-9;
  const ms = performance.now() - t0;
  return s > 0 ? ms : ms;
}

/** Calls f until `seconds` have passed: V8 needs about a second of calls to reach its optimized steady state here. */
function warmUp(f: () => void, seconds: number): number {
  const end = performance.now() + seconds * 1000;
  let calls = 0;
  while (performance.now() < end) {
    f();
    calls++;
  }
  return calls;
}

/**
 * Median over all rounds (after a warm-up), and the best median of batches of 100: on a shared
 * machine the best batch is the closest figure to an idle core (both are printed).
 */
function timeOne(analyze: Analyze, req: AnalyzeRequest, rounds: number, warmSeconds: number): { medianUs: number; bestBatchUs: number; cpuUs: number; perSecond: number } {
  warmUp(() => analyze(req), warmSeconds);
  const samples: number[] = [];
  const batches: number[] = [];
  const c0 = process.cpuUsage();
  const start = performance.now();
  for (let i = 0; i < rounds; i++) {
    const t0 = performance.now();
    analyze(req);
    samples.push(performance.now() - t0);
    if (samples.length % 100 === 0) batches.push(median(samples.slice(-100)));
  }
  const elapsed = (performance.now() - start) / 1000;
  const cpu = process.cpuUsage(c0);
  return {
    medianUs: median(samples) * 1000,
    bestBatchUs: Math.min(...batches) * 1000,
    cpuUs: (cpu.user + cpu.system) / rounds,
    perSecond: Math.round(rounds / elapsed),
  };
}

export async function run(): Promise<void> {
  const bundle = await engineBundle();
  const full = timeOne(bundle.analyze, benchRequest, 3000, 2);
  const parts = (['step', 'frequency', 'margins'] as const).map((k) => {
    const analyses = { [k]: benchRequest.analyses![k] };
    return `${k} ${timeOne(bundle.analyze, { ...benchRequest, analyses }, 1000, 0.5).medianUs.toFixed(0)} µs`;
  });
  console.log('engine: full analysis (4th-order plant + dead time, filtered ideal PID, 1001-point step, 200-point frequency response, margins, Ms)');
  console.log(`engine: median ${full.medianUs.toFixed(1)} µs per analysis (client bundle, after 2 s of warm-up; target ≤ 200 µs; best batch of 100: ${full.bestBatchUs.toFixed(1)} µs), ${full.perSecond} analyses/s on one core, ${full.cpuUs.toFixed(1)} µs CPU per analysis`);
  console.log(`engine: parts alone (medians, each with validation and factoring): ${parts.join(', ')}`);
  console.log(`engine: context: load average ${loadavg()[0].toFixed(1)}, reference loop of 10⁷ dependent additions ${referenceLoopMs().toFixed(0)} ms (about 10–15 ms on an idle core)`);
  console.log(`engine: client bundle of src/lib/control/index.ts: ${(bundle.raw / 1024).toFixed(1)} KiB minified, ${(bundle.gzip / 1024).toFixed(1)} KiB gzip`);
}
