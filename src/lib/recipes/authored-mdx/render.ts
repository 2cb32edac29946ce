import { unified } from 'unified';
import remarkRehype from 'remark-rehype';
import rehypeKatex from 'rehype-katex';
import rehypeSanitize from 'rehype-sanitize';
import rehypeStringify from 'rehype-stringify';
import type { Root as MdastRoot } from 'mdast';
import type { Element, ElementContent, Root as HastRoot } from 'hast';
import type { State } from 'mdast-util-to-hast';
import { visit } from 'unist-util-visit';
import { AUTHORED_SANITIZE_SCHEMA } from './sanitize-schema';
import type { PlacedIsland } from './validate';

/** KaTeX limits for authored formulas: sizes in em, macro expansions per formula. */
export const KATEX_LIMITS = { maxSize: 20, maxExpand: 200 } as const;

/**
 * Turns a validated tree into HTML: Markdown → HTML, formulas through KaTeX (untrusted: no
 * \href, \url, \html…), then the sanitizer, then each calculator becomes an inert placeholder
 * `<div data-island="Name" data-props="{json}">`, which pages split out and render as islands
 * (islands-in-html.ts).
 * The placeholders are written after sanitizing, from the validated props, never from the body.
 */
export function renderTree(tree: MdastRoot, islands: PlacedIsland[]): string {
  let slot = 0;
  const processor = unified()
    .use(remarkRehype, {
      handlers: {
        mdxJsxFlowElement: (): Element => ({ type: 'element', tagName: 'div', properties: { dataIslandSlot: String(slot++) }, children: [] }),
        mdxFlowExpression: () => undefined,
        mdxTextExpression: () => undefined,
      } as Record<string, (state: State, node: never) => ElementContent | undefined>,
    })
    // A fresh options object per body: KaTeX's \gdef writes into `macros`, which must never be shared.
    .use(rehypeKatex, { trust: false, strict: 'ignore', throwOnError: false, maxSize: KATEX_LIMITS.maxSize, maxExpand: KATEX_LIMITS.maxExpand, macros: {} } as Parameters<typeof rehypeKatex>[0])
    .use(rehypeSanitize, AUTHORED_SANITIZE_SCHEMA)
    .use(() => (hast: HastRoot) => placeIslands(hast, islands))
    .use(rehypeStringify);
  const hast = processor.runSync(tree as never) as HastRoot;
  return processor.stringify(hast);
}

function placeIslands(tree: HastRoot, islands: PlacedIsland[]): void {
  visit(tree, 'element', (node: Element) => {
    if (node.tagName === 'a') node.properties = { ...node.properties, rel: ['nofollow', 'noopener', 'noreferrer'] };
    if (node.tagName !== 'div' || node.properties?.dataIslandSlot === undefined) return;
    const island = islands[Number(node.properties.dataIslandSlot)];
    if (!island) {
      node.tagName = 'p';
      node.properties = {};
      node.children = [{ type: 'text', value: '(calculator missing)' }];
      return;
    }
    node.properties = { className: ['authored-island'], dataIsland: island.name, dataProps: jsonForAttribute(island.props) };
    node.children = [{ type: 'element', tagName: 'p', properties: { className: ['island-fallback'] }, children: [{ type: 'text', value: `${island.name} calculator (loading…)` }] }];
  });
}

/** JSON with <, > and & as \u escapes: the same value when parsed, and no markup-like text in the page. */
function jsonForAttribute(value: unknown): string {
  return JSON.stringify(value).replace(/[<>&]/g, (c) => `\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`);
}
