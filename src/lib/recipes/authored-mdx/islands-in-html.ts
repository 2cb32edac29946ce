import { ALLOWED_COMPONENT_NAMES, type AllowedComponentName } from './component-names';

/** A stretch of compiled HTML, or one calculator placed between stretches. */
export type BodySegment = { kind: 'html'; html: string } | { kind: 'island'; name: AllowedComponentName; props: Record<string, unknown> };

// Exactly what render.ts writes for a placeholder; anything else stays HTML.
const PLACEHOLDER = /<div class="authored-island" data-island="([A-Za-z]+)" data-props="([^"]*)"><p class="island-fallback">[^<]*<\/p><\/div>/g;

function decodeAttribute(value: string): string {
  return value
    .replace(/&#x([0-9a-fA-F]+);/g, (_, h) => String.fromCodePoint(parseInt(h, 16)))
    .replace(/&#(\d+);/g, (_, d) => String.fromCodePoint(Number(d)))
    .replace(/&quot;/g, '"')
    .replace(/&amp;/g, '&');
}

/**
 * Splits a compiled body at its calculator placeholders, so pages can render each calculator
 * as a real island (the same component and chunk as on file recipes) between the HTML parts.
 * Names outside the whitelist and unreadable props are left as the inert placeholder HTML.
 */
export function splitIslands(html: string): BodySegment[] {
  const out: BodySegment[] = [];
  let last = 0;
  for (const m of html.matchAll(PLACEHOLDER)) {
    const name = m[1];
    let props: Record<string, unknown> | null = null;
    try {
      const parsed = JSON.parse(decodeAttribute(m[2]));
      if (parsed && typeof parsed === 'object' && !Array.isArray(parsed)) props = parsed;
    } catch {
      props = null;
    }
    if (!props || !(ALLOWED_COMPONENT_NAMES as readonly string[]).includes(name)) continue;
    if (m.index > last) out.push({ kind: 'html', html: html.slice(last, m.index) });
    out.push({ kind: 'island', name: name as AllowedComponentName, props });
    last = m.index + m[0].length;
  }
  if (last < html.length) out.push({ kind: 'html', html: html.slice(last) });
  return out;
}
