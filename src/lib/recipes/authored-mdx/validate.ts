import type { Root, RootContent } from 'mdast';
import type { MdxJsxAttribute, MdxJsxExpressionAttribute, MdxJsxFlowElement } from 'mdast-util-mdx-jsx';
import type { Node as EsNode, Program } from 'estree';
import { ALLOWED_COMPONENTS, ALLOWED_COMPONENT_NAMES, isAllowedComponent, type AllowedComponentName } from './allowed-components';
import { literalFromProgram, type LiteralValue } from './literal';
import { problemAt, type BodyProblem, type SourcePoint } from './problem';

/** A calculator placed in the body, with props that passed its schema. */
export interface PlacedIsland {
  name: AllowedComponentName;
  props: Record<string, unknown>;
}

/** Everything wrong with a body (empty when it may be saved) and the islands it places, in order. */
export interface ValidationResult {
  problems: BodyProblem[];
  islands: PlacedIsland[];
}

/** Markdown node types an authored body may contain. */
const MARKDOWN_TYPES = new Set([
  'root', 'paragraph', 'heading', 'thematicBreak', 'blockquote', 'list', 'listItem', 'table', 'tableRow',
  'tableCell', 'code', 'inlineCode', 'text', 'emphasis', 'strong', 'delete', 'break', 'link', 'linkReference',
  'definition', 'footnoteDefinition', 'footnoteReference', 'math', 'inlineMath',
]);

const ALLOWED_LIST = ALLOWED_COMPONENT_NAMES.map((n) => `<${n} />`).join(', ');

/**
 * Walks the tree and refuses, with line and column, everything that could run or inject code:
 * imports/exports, expressions (an empty comment is allowed), raw HTML and unknown elements,
 * spreads, attribute values not built from literals, and props a calculator's schema refuses.
 * Each island placed gets its validated props in `islands`, in document order.
 */
export function validateTree(tree: Root): ValidationResult {
  const problems: BodyProblem[] = [];
  const islands: PlacedIsland[] = [];
  const visit = (node: Root | RootContent, depth: number) => {
    const at = node.position?.start;
    switch (node.type) {
      case 'mdxjsEsm':
        problems.push(problemAt(at, 'import and export statements are not allowed; the calculators are available without importing them.'));
        return;
      case 'mdxFlowExpression':
      case 'mdxTextExpression': {
        const program = node.data?.estree as Program | undefined;
        if (!program || program.body.length > 0) {
          problems.push(problemAt(at, 'Expressions in braces are not allowed; write the value itself, or escape the brace as \\{.'));
        }
        return;
      }
      case 'mdxJsxTextElement':
        problems.push(problemAt(at, node.name && isAllowedComponent(node.name)
          ? `Put <${node.name} /> on a line of its own, with blank lines around it.`
          : elementRefusal(node.name)));
        return;
      case 'mdxJsxFlowElement': {
        if (depth > 1 && isAllowedComponent(node.name)) {
          problems.push(problemAt(at, `Put <${node.name} /> at the top level of the body, not inside a list, quote or table.`));
          return;
        }
        const island = checkElement(node, problems);
        if (island) islands.push(island);
        return;
      }
      case 'image':
      case 'imageReference':
        problems.push(problemAt(at, 'Images are not allowed in authored recipes; link to the drawing or photo instead.'));
        return;
      case 'link':
      case 'definition':
        if (!isSafeUrl(node.url)) {
          problems.push(problemAt(at, 'Links may point only to http:, https: or mailto: addresses, or to a page of this site.'));
          return;
        }
        break;
      case 'html':
        problems.push(problemAt(at, 'Raw HTML is not allowed; use Markdown.'));
        return;
      default:
        if (!MARKDOWN_TYPES.has(node.type)) {
          problems.push(problemAt(at, `This kind of content (${node.type}) is not allowed.`));
          return;
        }
    }
    if ('children' in node) for (const child of node.children as RootContent[]) visit(child, depth + 1);
  };
  visit(tree, 0);
  return { problems, islands };
}

/** http(s), mailto, or a relative path / fragment with no scheme at all. */
function isSafeUrl(url: string): boolean {
  // Browsers ignore control characters and whitespace inside a scheme ("java\tscript:").
  const squeezed = url.replace(/[\u0000-\u0020\u007f-\u009f]/g, '');
  const scheme = /^([a-zA-Z][a-zA-Z0-9+.-]*):/.exec(squeezed)?.[1]?.toLowerCase();
  if (scheme) return scheme === 'http' || scheme === 'https' || scheme === 'mailto';
  return !squeezed.startsWith('//') && !/^[^/?#]*:/.test(squeezed) && !/&#|&[a-z]+;/i.test(url);
}

function elementRefusal(name: string | null | undefined): string {
  if (!name) return `Fragments (<>…</>) are not allowed. Allowed elements: ${ALLOWED_LIST}.`;
  if (/^[a-z]/.test(name)) return `HTML elements such as <${name}> are not allowed; use Markdown for text, and only ${ALLOWED_LIST}.`;
  return `<${name}> is not an allowed component. Allowed: ${ALLOWED_LIST}.`;
}

function checkElement(node: MdxJsxFlowElement, problems: BodyProblem[]): PlacedIsland | null {
  const at = node.position?.start;
  if (!isAllowedComponent(node.name)) {
    problems.push(problemAt(at, elementRefusal(node.name)));
    return null;
  }
  if (node.children.length > 0) {
    problems.push(problemAt(at, `<${node.name}> takes no content between its tags; write it self-closing: <${node.name} … />.`));
    return null;
  }
  const props: Record<string, LiteralValue> = {};
  let ok = true;
  for (const attr of node.attributes) {
    const value = attributeValue(attr, node.name, problems, at);
    if (value === undefined) ok = false;
    else if (Object.hasOwn(props, (attr as MdxJsxAttribute).name)) {
      problems.push(problemAt(at, `<${node.name}> sets "${(attr as MdxJsxAttribute).name}" twice.`));
      ok = false;
    } else props[(attr as MdxJsxAttribute).name] = value;
  }
  if (!ok) return null;
  const parsed = ALLOWED_COMPONENTS[node.name].safeParse(props);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const where = issue.path.length ? issue.path.join('.') : 'props';
    problems.push(problemAt(at, `<${node.name}> ${where}: ${issue.message.replace(/\.?$/, '.')}`));
    return null;
  }
  return { name: node.name, props: parsed.data as Record<string, unknown> };
}

/** The literal value of one attribute, or undefined after recording why it is refused. */
function attributeValue(
  attr: MdxJsxAttribute | MdxJsxExpressionAttribute,
  component: string,
  problems: BodyProblem[],
  fallback: SourcePoint | undefined,
): LiteralValue | undefined {
  const at = attr.position?.start ?? fallback;
  if (attr.type === 'mdxJsxExpressionAttribute') {
    problems.push(problemAt(at, `Spread attributes ({...}) are not allowed on <${component}>; write each prop as name={value}.`));
    return undefined;
  }
  if (!/^[A-Za-z][A-Za-z0-9]*$/.test(attr.name)) {
    problems.push(problemAt(at, `"${attr.name}" is not a prop of <${component}>.`));
    return undefined;
  }
  if (attr.value === null || attr.value === undefined) return true;
  if (typeof attr.value === 'string') return attr.value;
  const result = literalFromProgram(attr.value.data?.estree as Program | undefined);
  if (result.ok) return result.value;
  problems.push(problemAt(estreePoint(result.node) ?? at, `In "${attr.name}" of <${component}>: ${result.reason}`));
  return undefined;
}

/** estree columns are 0-based; ours are 1-based. */
function estreePoint(node: EsNode | undefined): SourcePoint | null {
  const start = node?.loc?.start;
  return start ? { line: start.line, column: start.column + 1 } : null;
}
