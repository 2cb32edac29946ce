import { useEffect, useState } from 'react';

type Katex = typeof import('katex');
let katexLoad: Promise<Katex> | null = null;

/**
 * KaTeX HTML for a formula, or null until KaTeX has loaded. KaTeX is about 76 KB gzipped, more
 * than the rest of a calculator, so it is fetched only by the islands that typeset, after they
 * hydrate; until then the caller shows the formula as plain text in the same reserved space.
 */
export function useTypeset(tex: string): string | null {
  const [html, setHtml] = useState<string | null>(null);
  useEffect(() => {
    let live = true;
    katexLoad ??= import('katex');
    katexLoad
      .then((mod) => {
        const katex = (mod as unknown as { default?: Katex }).default ?? mod;
        if (live) setHtml(katex.renderToString(tex, { displayMode: true, throwOnError: false, trust: false, maxSize: 20, maxExpand: 200 }));
      })
      .catch(() => live && setHtml(null));
    return () => {
      live = false;
    };
  }, [tex]);
  return html;
}
