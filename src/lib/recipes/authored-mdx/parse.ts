import { unified } from 'unified';
import remarkParse from 'remark-parse';
import remarkMdx from 'remark-mdx';
import remarkMath from 'remark-math';
import remarkGfm from 'remark-gfm';
import type { Root } from 'mdast';
import { problemAt, type BodyProblem } from './problem';

const parser = unified().use(remarkParse).use(remarkMdx).use(remarkGfm).use(remarkMath);

/** The body's syntax tree. Parsing only: nothing in the body is evaluated. */
export type ParseResult = { ok: true; tree: Root } | { ok: false; problem: BodyProblem };

/** Parses an authored body as MDX with GFM and math; a syntax error becomes a located problem. */
export function parseBody(body: string): ParseResult {
  try {
    return { ok: true, tree: parser.runSync(parser.parse(body)) as Root };
  } catch (err) {
    const e = err as { line?: number; column?: number; place?: { line?: number; column?: number; start?: { line?: number; column?: number } }; reason?: string; message?: string };
    const place = e.place && 'start' in e.place ? e.place.start : e.place;
    const point = { line: e.line ?? place?.line, column: e.column ?? place?.column };
    const reason = (e.reason ?? e.message ?? 'The body could not be read').replace(/\.?$/, '.');
    return { ok: false, problem: problemAt(point, `${reason} (MDX syntax; write < as &lt; and { as \\{ in text).`) };
  }
}
