/**
 * Field data: parsing step-test CSV files (10 000 and 180 000 rows, the most that fit in 5 MB at this precision, semicolons and decimal
 * commas) and fitting all three models to a test thinned to the fit's sample budget.
 */
import { parseStepTest } from '../../src/lib/fielddata/csv';
import { fitSeries } from '../../src/lib/fielddata/fit';
import { toCsv } from '../support/step-test-csv';

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function time(fn: () => void, runs: number): number {
  fn();
  const out: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    fn();
    out.push(performance.now() - start);
  }
  return median(out);
}

export async function run(): Promise<void> {
  const mapping = { time: { column: 1, unit: 's' }, pv: { column: 2, unit: '°C' }, co: { column: 3, unit: '%' } } as const;
  for (const n of [10_000, 180_000]) {
    const text = toCsv({ model: { type: 'fopdt', k: 0.42, tau: 30 * (n / 1000), theta: 4 }, dt: 0.5, n, stepAt: 20, u0: 40, u1: 45, y0: 71.8, sigma: 0.02, seed: 1 }, { european: true });
    const bytes = new TextEncoder().encode(text);
    const ms = time(() => parseStepTest(bytes, mapping), n > 50_000 ? 3 : 9);
    console.log(`parse ${n} rows (${(bytes.byteLength / 1024 / 1024).toFixed(1)} MB): median ${ms.toFixed(0)} ms, ${((n / ms) * 1000 / 1e6).toFixed(2)} M rows/s`);
    const parsed = parseStepTest(bytes, mapping);
    if (!parsed.ok) throw new Error(parsed.issues[0].message);
    const fitMs = time(() => fitSeries(parsed.series), 3);
    console.log(`fit fopdt+sopdt+ipdt on ${n} rows (thinned to ≤ 2000): median ${fitMs.toFixed(0)} ms`);
  }
}
