/**
 * Compile time of authored recipe bodies (parse, checks, KaTeX, sanitize), in this thread and
 * through the worker the server uses: a typical recipe (the temperature template), a long one
 * (the template repeated to about 60 KB, hundreds of formulas) and the worst accepted marker run.
 * Prints p50/p95 in ms; the machine is shared, so read them as orders of magnitude.
 */
import { compileBody } from '../../src/lib/recipes/authored-mdx/compile';
import { compileBodyIsolated, stopCompileWorker } from '../../src/lib/recipes/authored-mdx/compile-isolated';
import { defaultTemplate } from '../../src/lib/editorial/default-templates';

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

async function time(label: string, runs: number, fn: () => unknown): Promise<void> {
  const ms: number[] = [];
  for (let i = 0; i < runs; i++) {
    const t0 = performance.now();
    await fn();
    ms.push(performance.now() - t0);
  }
  ms.sort((a, b) => a - b);
  console.log(`${label.padEnd(44)} p50 ${percentile(ms, 50).toFixed(1).padStart(7)} ms   p95 ${percentile(ms, 95).toFixed(1).padStart(7)} ms   (${runs} runs)`);
}

export async function run(): Promise<void> {
  const typical = defaultTemplate('temperature').body;
  const section = `${typical}\nFormula $\\tau_c = \\theta$ and $$K_c = \\frac{\\tau}{K(\\tau_c + \\theta)}$$\n\n`;
  const long = section.repeat(Math.floor(60_000 / section.length));
  const markers = 'a* '.repeat(990);
  for (const [name, body] of [['typical', typical], ['long', long], ['markers', markers]] as const) {
    const r = compileBody(body);
    if (!r.ok) throw new Error(`${name} body refused: ${r.problems[0].reason}`);
  }
  console.log(`bodies: typical ${(typical.length / 1024).toFixed(1)} KB, long ${(long.length / 1024).toFixed(1)} KB, markers ${(markers.length / 1024).toFixed(1)} KB`);
  await time('compileBody, typical recipe', 30, () => compileBody(typical));
  await time('compileBody, ~60 KB with many formulas', 5, () => compileBody(long));
  await time('compileBody, 2970 emphasis markers', 10, () => compileBody(markers));
  await compileBodyIsolated('# warm-up');
  await time('compileBodyIsolated (worker), typical recipe', 30, () => compileBodyIsolated(typical));
  await stopCompileWorker();
}
