import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { describe, expect, it } from 'vitest';

/**
 * Budgets for the JavaScript each calculator island ships, read from the built client bundle
 * (dist/client/_astro; `npm test` builds first). An island's cost is its own chunk plus every
 * chunk it statically imports, gzipped; chunks fetched later by dynamic import (KaTeX, loaded
 * only by the block chain after it hydrates) are reported apart. React's renderer (about 67 KB)
 * is shared by every island and counted once per page.
 */
const ASSETS = path.resolve('dist/client/_astro');

/**
 * KB gzip per island, React excluded, set about 5 % above the size measured when each island
 * landed. Most of every island is shared: uPlot (about 24 KB) and zod (its core about 15 KB,
 * the full build about 29 KB) are chunks loaded once per page however many calculators it has.
 * The loop response and the frequency view check links with zod/mini (link-state.ts).
 * The three islands that run the engine's analyses were raised by 2 KB when the engine gained
 * modal stepping and a shared frequency scan (its bundle went from 18.8 to 20.8 KB gzip for
 * an analysis about 1.8× faster; `npm run bench -- engine`).
 */
const ISLAND_BUDGETS: Record<string, number> = {
  LoopResponse: 68,
  FrequencyView: 67,
  TuningComparison: 82,
  BlockChain: 76,
  PidConverter: 37,
  Discretizer: 77,
};
/** The whole page (React, Astro's island loader and two calculators), KB gzip. */
const PAGE_BUDGET = 150;

const STATIC_IMPORT = /(?:import|export)\s*(?:[\w$*{}\s,]*?\s*from\s*)?["']\.\/([^"']+\.js)["']/g;
const DYNAMIC_IMPORT = /import\(\s*["']\.\/([^"']+\.js)["']\s*\)/g;

function gzipKb(file: string): number {
  return zlib.gzipSync(fs.readFileSync(path.join(ASSETS, file)), { level: 9 }).length / 1024;
}

/** The chunk and everything it statically imports, transitively; dynamic imports listed apart. */
function graph(entry: string): { files: Set<string>; lazy: Set<string> } {
  const files = new Set<string>();
  const lazy = new Set<string>();
  const visit = (file: string) => {
    if (files.has(file)) return;
    files.add(file);
    const code = fs.readFileSync(path.join(ASSETS, file), 'utf8');
    for (const m of code.matchAll(DYNAMIC_IMPORT)) lazy.add(m[1]!);
    const withoutDynamic = code.replace(DYNAMIC_IMPORT, '');
    for (const m of withoutDynamic.matchAll(STATIC_IMPORT)) visit(m[1]!);
  };
  visit(entry);
  for (const f of files) lazy.delete(f);
  return { files, lazy };
}

function chunk(prefix: string): string {
  const found = fs.readdirSync(ASSETS).find((f) => f.startsWith(`${prefix}.`) && f.endsWith('.js'));
  if (!found) throw new Error(`No built chunk for ${prefix} in ${ASSETS}: run \`npm run build\` first.`);
  return found;
}

/**
 * A message of typed-function, the dispatcher inside every mathjs build, that minifying keeps
 * (checked: it is in node_modules/mathjs/lib/browser/math.js).
 */
const MATHJS_MARK = /Unexpected type of argument/;

const sum = (files: Iterable<string>) => [...files].reduce((kb, f) => kb + gzipKb(f), 0);

describe('calculator bundle sizes', () => {
  it('finds the built client bundle', () => {
    expect(fs.existsSync(ASSETS), `No build at ${ASSETS}: run \`npm run build\` first.`).toBe(true);
  });

  for (const [island, budget] of Object.entries(ISLAND_BUDGETS)) {
    it(`keeps ${island} under ${budget} KB gzip, React excluded`, () => {
      const react = graph(chunk('client'));
      const { files, lazy } = graph(chunk(island));
      const own = [...files].filter((f) => !react.files.has(f));
      const kb = sum(own);
      console.log(`${island}: ${kb.toFixed(1)} KB gzip (${own.length} chunks)${lazy.size ? `, later on demand ${sum(lazy).toFixed(1)} KB (${[...lazy].join(', ')})` : ''}`);
      expect(kb).toBeLessThan(budget);
    });
  }

  it('ships no mathjs in any calculator (the engine parser stays on the server)', () => {
    expect(fs.readFileSync(path.resolve('node_modules/mathjs/lib/browser/math.js'), 'utf8')).toMatch(MATHJS_MARK);
    for (const island of Object.keys(ISLAND_BUDGETS)) {
      const { files, lazy } = graph(chunk(island));
      for (const f of [...files, ...lazy]) {
        expect(fs.readFileSync(path.join(ASSETS, f), 'utf8'), `${island} pulls mathjs through ${f}`).not.toMatch(MATHJS_MARK);
      }
    }
  });

  it(`keeps a recipe page with a loop response and a frequency view under ${PAGE_BUDGET} KB gzip in total`, () => {
    const files = new Set<string>();
    for (const entry of [chunk('client'), chunk('LoopResponse'), chunk('FrequencyView'), chunk('ThemeSwitch')]) for (const f of graph(entry).files) files.add(f);
    const kb = sum(files);
    console.log(`recipe page (React + loop response + frequency view + palette switch): ${kb.toFixed(1)} KB gzip`);
    expect(kb).toBeLessThan(PAGE_BUDGET);
  });
});
