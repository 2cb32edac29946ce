/**
 * Search index for 10 000 generated recipes: build time, and p50/p95 of single queries
 * (target p95 < 5 ms). Text is drawn with a seeded generator, so every run indexes the same
 * corpus: the plant vocabulary below plus 20 000 made-up words with Zipf frequencies, as words
 * are spread in real prose (a corpus of 100 words repeated would match every recipe on every query).
 */
import { performance } from 'node:perf_hooks';
import { createSearchIndex } from '../../src/lib/recipes/search/index';
import { makeRecord } from '../lib/recipes/make-record';
import { LOOP_TYPES } from '../../src/lib/recipes/vocabulary';

const WORDS = (
  'pasteurizer hold tube regeneration section hot water steam valve positioner flow meter level silo balance tank ' +
  'glycol chiller compressor suction boiler header drum feedwater caustic acid rinse conductivity dosing pump ' +
  'conveyor filler capper palletiser dancer unwinder speed drive inverter torque temperature pressure integral ' +
  'derivative proportional band reset windup cascade feedforward ratio trim deadtime lag lead overshoot settling ' +
  'margin robustness sensitivity oscillation stiction hysteresis deadband transmitter damping thermowell probe ' +
  'neutralisation titration curve nonlinearity averaging surge tight interlock manual automatic bumpless commissioning'
).split(' ');

const TAG_LETTERS = ['TIC', 'FIC', 'LIC', 'PIC', 'AIC', 'SIC', 'ZIC'];

/** Park–Miller minimal standard generator: the same corpus on every run. */
function generator(seed: number) {
  let s = seed;
  return () => (s = (s * 16807) % 2147483647) / 2147483647;
}

function percentile(sorted: number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

export async function run(): Promise<void> {
  const rand = generator(42);
  const letters = 'abcdefghijklmnopqrstuvwxyz';
  const vocabulary: string[] = [];
  while (vocabulary.length < 20_000) {
    vocabulary.push(Array.from({ length: 4 + Math.floor(rand() * 7) }, () => letters[Math.floor(rand() * 26)]).join(''));
  }
  // The plant's words sit at ranks 200–5000: in 1–30 % of recipes, as equipment names are.
  WORDS.forEach((w, i) => (vocabulary[200 + Math.floor((i * 4800) / WORDS.length)] = w));
  // Zipf: the word of rank r is drawn with probability ∝ 1/r (inverse-CDF on a log scale).
  const zipf = () => Math.min(vocabulary.length - 1, Math.floor(Math.exp(rand() * Math.log(vocabulary.length + 1)) - 1));
  const word = () => vocabulary[zipf()];
  const plantWord = () => WORDS[Math.floor(rand() * WORDS.length)];
  const words = (n: number) => Array.from({ length: n }, word).join(' ');
  const records = Array.from({ length: 10_000 }, (_, i) =>
    makeRecord(`generated-${i}`, {
      title: `${words(3)} ${i}`,
      summary: words(25),
      loopType: LOOP_TYPES[i % LOOP_TYPES.length],
      loopTags: [`${TAG_LETTERS[i % TAG_LETTERS.length]}-${100 + (i % 900)}`],
      tags: [word(), word()],
      status: i % 10 === 0 ? 'retired' : 'published',
      ...(i % 10 === 0 ? { retiredReason: 'Generated.' } : {}),
    }, words(300)),
  );

  const t0 = performance.now();
  const index = createSearchIndex(records);
  const buildMs = performance.now() - t0;

  const queries = Array.from({ length: 400 }, (_, i) => {
    const w = plantWord();
    if (i % 4 === 0) return w.slice(0, 4); // prefix
    if (i % 4 === 1) return w.slice(0, 2) + w.slice(3); // a dropped letter
    if (i % 4 === 2) return `${w} ${plantWord()}`;
    return `${TAG_LETTERS[i % TAG_LETTERS.length]}-${100 + i}`;
  });
  // Broad queries: the commonest words, found in nearly every recipe (the worst case).
  const broad = vocabulary.slice(0, 20);
  const time = (qs: string[]) =>
    qs.map((q) => {
      const s = performance.now();
      index.search(q, { limit: 20 });
      return performance.now() - s;
    }).sort((a, b) => a - b);
  time(queries.slice(0, 20)); // warm-up
  const times = time(queries);
  const kinds = ['word prefix', 'misspelled word', 'two words', 'loop tag'];
  const byKind = kinds.map((k, j) => {
    const t = time(queries.filter((_, i) => i % 4 === j));
    return `${k} p50 ${percentile(t, 50).toFixed(2)} / p95 ${percentile(t, 95).toFixed(2)} ms`;
  });
  const broadTimes = time(broad);
  // Two typos in a long word (two middle letters swapped): the slowest path, one walk of the
  // term tree within one edit and one within two.
  const twoTypos = WORDS.filter((w) => w.length > 8).map((w) => w.slice(0, 3) + w[4] + w[3] + w.slice(5));
  const twoTypoTimes = time(twoTypos);

  console.log(`recipes indexed: ${index.size}`);
  console.log(`index build: ${buildMs.toFixed(0)} ms`);
  console.log(`query p50: ${percentile(times, 50).toFixed(2)} ms, p95: ${percentile(times, 95).toFixed(2)} ms (target p95 < 5 ms) over ${times.length} queries`);
  console.log(`  by kind: ${byKind.join('; ')}`);
  console.log(`broad queries (a word in most recipes): p50 ${percentile(broadTimes, 50).toFixed(1)} ms, p95 ${percentile(broadTimes, 95).toFixed(1)} ms`);
  console.log(`two typos in a long word (${twoTypos.length} words): p50 ${percentile(twoTypoTimes, 50).toFixed(2)} ms, p95 ${percentile(twoTypoTimes, 95).toFixed(2)} ms`);
}
