/**
 * Step-test identification: median time of one fit of a 600-sample test with 1 % noise, for
 * each model type, and fits per second.
 */
import { identify } from '../../src/lib/control/identify';
import { seededGaussian } from '../lib/control/seeded-noise';

function stepTest(shape: (s: number) => number, seed: number): { t: number[]; y: number[]; u: number[] } {
  const noise = seededGaussian(seed);
  const t = Array.from({ length: 600 }, (_, i) => i * 0.5);
  const u = t.map((v) => (v >= 15 ? 45 : 40));
  const y = t.map((v) => 60 + 5 * shape(v - 15 - 6) + 0.05 * noise());
  return { t, y, u };
}

const cases = [
  { model: 'fopdt' as const, shape: (s: number) => (s > 0 ? 0.4 * (1 - Math.exp(-s / 40)) : 0) },
  { model: 'sopdt' as const, shape: (s: number) => (s > 0 ? 0.4 * (1 - (40 * Math.exp(-s / 40) - 10 * Math.exp(-s / 10)) / 30) : 0) },
  { model: 'ipdt' as const, shape: (s: number) => (s > 0 ? 0.004 * s : 0) },
];

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

export async function run(): Promise<void> {
  for (const c of cases) {
    const data = stepTest(c.shape, 17);
    identify({ ...data, model: c.model }); // warm-up
    const times: number[] = [];
    for (let i = 0; i < 15; i++) {
      const start = performance.now();
      identify({ ...data, model: c.model });
      times.push(performance.now() - start);
    }
    const ms = median(times);
    console.log(`identify ${c.model}, 600 samples: median ${ms.toFixed(1)} ms, ${(1000 / ms).toFixed(1)} fits/s`);
  }
}
