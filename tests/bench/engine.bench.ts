/**
 * Engine benchmark: one full analysis of a loop with a 4th-order plant with dead time and a
 * filtered ideal PID (1001-point closed-loop step, 200-point frequency response, margins, Ms),
 * plus the gzip size of the engine as a minified client bundle.
 */
import { gzipSync } from 'node:zlib';
import { fileURLToPath } from 'node:url';
import { build } from 'esbuild';
import { analyze, type AnalyzeRequest } from '../../src/lib/control/index';

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

async function bundleGzipBytes(): Promise<{ raw: number; gzip: number }> {
  const entry = fileURLToPath(new URL('../../src/lib/control/index.ts', import.meta.url));
  const out = await build({ entryPoints: [entry], bundle: true, minify: true, format: 'esm', write: false, platform: 'browser' });
  const code = out.outputFiles[0].contents;
  return { raw: code.length, gzip: gzipSync(code, { level: 9 }).length };
}

export async function run(): Promise<void> {
  for (let i = 0; i < 300; i++) analyze(benchRequest);
  const samples: number[] = [];
  const rounds = 2000;
  const start = performance.now();
  for (let i = 0; i < rounds; i++) {
    const t0 = performance.now();
    analyze(benchRequest);
    samples.push(performance.now() - t0);
  }
  const elapsed = (performance.now() - start) / 1000;
  const size = await bundleGzipBytes();
  console.log(`engine: full analysis (4th-order plant + dead time, filtered ideal PID, 1001-point step, 200-point frequency response, margins, Ms)`);
  console.log(`engine: median ${(median(samples) * 1000).toFixed(1)} µs per analysis (target ≤ 200 µs), ${Math.round(rounds / elapsed)} analyses/s on one core`);
  console.log(`engine: client bundle of src/lib/control/index.ts: ${(size.raw / 1024).toFixed(1)} KiB minified, ${(size.gzip / 1024).toFixed(1)} KiB gzip`);
}
