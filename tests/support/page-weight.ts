import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';

const CLIENT_DIR = path.resolve('dist/client');

/** What a page ships as JavaScript: every file (by path) and each inline script, gzip-sized. */
export interface PageWeight {
  /** Built files the page loads at once: script tags, module preloads, islands and their static imports. */
  eager: { file: string; gzipBytes: number }[];
  /** Files an island imports on demand (`import("…")`), loaded when it renders. */
  lazy: { file: string; gzipBytes: number }[];
  /** Gzip size of the inline scripts together. */
  inlineGzipBytes: number;
  /** Everything above, in bytes. */
  totalGzipBytes: number;
}

const gzipSize = (text: string | Buffer) => zlib.gzipSync(text, { level: 9 }).length;

/** The built files a page's HTML points at, as paths like "/_astro/x.js". */
function entryPoints(html: string): string[] {
  const found = new Set<string>();
  const patterns = [
    /<script[^>]*\ssrc="([^"]+\.js)"/g,
    /<link[^>]*rel="modulepreload"[^>]*href="([^"]+)"/g,
    /\scomponent-url="([^"]+)"/g,
    /\srenderer-url="([^"]+)"/g,
    /\bimport\s*\(\s*["'](\/_astro\/[^"']+\.js)["']\s*\)/g,
  ];
  for (const re of patterns) for (const m of html.matchAll(re)) found.add(m[1]);
  return [...found];
}

/** Static and dynamic imports of a built chunk, resolved against its folder. */
function importsOf(file: string, code: string): { staticImports: string[]; dynamicImports: string[] } {
  const dir = path.posix.dirname(file);
  const resolve = (spec: string) => (spec.startsWith('.') ? path.posix.join(dir, spec) : spec);
  const staticImports = [...code.matchAll(/(?:\bfrom\s*|\bimport\s*)["'](\.{1,2}\/[^"']+\.js)["']/g)].map((m) => resolve(m[1]));
  const dynamicImports = [...code.matchAll(/\bimport\(\s*["'](\.{1,2}\/[^"']+\.js)["']\s*\)/g)].map((m) => resolve(m[1]));
  return { staticImports, dynamicImports };
}

/**
 * Follows a page's scripts through dist/client: eager files (and their static imports), then the
 * files they import on demand. Inline scripts count too. Each file is counted once.
 */
export function pageWeight(html: string): PageWeight {
  const read = (file: string) => fs.readFileSync(path.join(CLIENT_DIR, file));
  const eager = new Map<string, number>();
  const lazy = new Map<string, number>();
  const pendingLazy: string[] = [];
  const walk = (file: string, into: Map<string, number>) => {
    if (eager.has(file) || into.has(file)) return;
    const code = read(file);
    into.set(file, gzipSize(code));
    const { staticImports, dynamicImports } = importsOf(file, code.toString('utf8'));
    for (const f of staticImports) walk(f, into);
    pendingLazy.push(...dynamicImports);
  };
  for (const f of entryPoints(html)) walk(f, eager);
  while (pendingLazy.length) walk(pendingLazy.pop()!, lazy);
  for (const f of eager.keys()) lazy.delete(f);
  const inline = [...html.matchAll(/<script(?![^>]*\ssrc=)[^>]*>([\s\S]*?)<\/script>/g)].map((m) => m[1]).join('\n');
  const inlineGzipBytes = inline.trim() ? gzipSize(inline) : 0;
  const list = (m: Map<string, number>) => [...m].map(([file, gzipBytes]) => ({ file, gzipBytes })).sort((a, b) => b.gzipBytes - a.gzipBytes);
  const sum = (m: Map<string, number>) => [...m.values()].reduce((a, b) => a + b, 0);
  return { eager: list(eager), lazy: list(lazy), inlineGzipBytes, totalGzipBytes: sum(eager) + sum(lazy) + inlineGzipBytes };
}
