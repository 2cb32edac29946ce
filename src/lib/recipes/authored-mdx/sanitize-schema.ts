import { defaultSchema } from 'rehype-sanitize';
import type { Schema } from 'hast-util-sanitize';

/** CSS properties KaTeX writes inline; any other property (and any url()) is dropped. */
const KATEX_STYLE_PROPERTIES = [
  'height', 'vertical-align', 'margin-right', 'margin-left', 'top', 'bottom', 'left', 'width', 'min-width',
  'padding-left', 'border-bottom-width', 'border-right-width', 'border-top-width', 'border-width',
  'border-style', 'color', 'position',
];
const STYLE_VALUE = String.raw`(?:-?\d*\.?\d+(?:em|ex|px|pt|%)?|0|solid|relative|absolute|#[0-9a-fA-F]{3,8}|[a-zA-Z]{3,20})`;
const DECLARATION = String.raw`\s*(?:${KATEX_STYLE_PROPERTIES.join('|')})\s*:\s*${STYLE_VALUE}\s*`;
/** A whole `style` value made only of KaTeX declarations with plain values. */
export const KATEX_STYLE = new RegExp(String.raw`^(?:${DECLARATION};?)+$`);

/**
 * KaTeX's class names: `katex…`, its atom and layout classes, and sizing classes. Utility classes
 * the site's CSS gives meaning to (fixed, absolute, hidden, sr-only, anything with : or [) never
 * match, so even a KaTeX bug could not make content cover the page.
 */
export const KATEX_CLASS = /^(?!(?:fixed|absolute|sticky|hidden|invisible|sr-only|contents|block|flex|grid|inset.*)$)(?:katex[a-z-]*|[a-z]+(?:-[a-z]+)*\d?|reset-size\d{1,2}|size\d{1,2}|vlist-[a-z]\d?)$/;

const MATHML_ELEMENTS = [
  'math', 'semantics', 'annotation', 'mrow', 'mi', 'mo', 'mn', 'ms', 'mtext', 'mspace', 'msup', 'msub', 'msubsup',
  'mfrac', 'msqrt', 'mroot', 'mover', 'munder', 'munderover', 'mpadded', 'mphantom', 'mstyle', 'mtable', 'mtr',
  'mtd', 'menclose', 'mglyph', 'merror', 'mlabeledtr',
];
const SVG_ELEMENTS = ['svg', 'path', 'line'];

const PLAIN_NUMBER = /^-?\d*\.?\d+(?:em|ex|px|pt|%)?$/;
const MATH_COLOR = /^(?:#[0-9a-fA-F]{3,8}|[a-zA-Z]{3,20})$/;

/**
 * GitHub-style sanitizing (rehype-sanitize's default) plus exactly what KaTeX emits. Ids are
 * prefixed once by remark-rehype (`user-content-`), so the sanitizer must not prefix again;
 * instead it only lets such prefixed ids through.
 */
export const AUTHORED_SANITIZE_SCHEMA: Schema = {
  ...defaultSchema,
  clobberPrefix: '',
  clobber: [],
  // Drop the content of refused elements too, not only their tags.
  strip: ['script', 'style', 'iframe', 'object', 'embed', 'template', 'noscript', 'textarea', 'title'],
  tagNames: [...(defaultSchema.tagNames ?? []).filter((t) => t !== 'img' && t !== 'input'), ...MATHML_ELEMENTS, ...SVG_ELEMENTS],
  protocols: { href: ['http', 'https', 'mailto'] },
  attributes: {
    ...defaultSchema.attributes,
    '*': [...(defaultSchema.attributes?.['*'] ?? []).filter((a) => a !== 'id' && a !== 'name' && a !== 'style'), ['id', /^user-content-[\w-]+$/]],
    a: [...(defaultSchema.attributes?.a ?? []), ['ariaDescribedBy', /^user-content-[\w-]+$/]],
    div: [['dataIslandSlot', /^\d{1,4}$/]],
    span: [['className', KATEX_CLASS], ['style', KATEX_STYLE], ['ariaHidden', 'true'], 'title'],
    math: [['xmlns', 'http://www.w3.org/1998/Math/MathML'], ['display', 'block', 'inline']],
    annotation: [['encoding', 'application/x-tex']],
    mo: [['stretchy', 'true', 'false'], ['fence', 'true', 'false'], ['minsize', PLAIN_NUMBER], ['maxsize', PLAIN_NUMBER], 'separator', 'lspace', 'rspace'],
    mi: [['mathvariant', /^[a-z-]{3,30}$/]],
    mpadded: [['width', PLAIN_NUMBER], ['height', PLAIN_NUMBER], ['lspace', PLAIN_NUMBER], ['voffset', PLAIN_NUMBER], ['depth', PLAIN_NUMBER]],
    mstyle: [['mathcolor', MATH_COLOR], ['scriptlevel', /^-?\d$/], ['displaystyle', 'true', 'false']],
    mtable: [['rowspacing', /^[\d.a-z %]{1,200}$/], ['columnalign', /^[a-z ]{1,200}$/], ['columnspacing', /^[\d.a-z %]{1,200}$/], ['width', PLAIN_NUMBER]],
    mtd: [['width', PLAIN_NUMBER]],
    mover: [['accent', 'true', 'false']],
    munder: [['accentunder', 'true', 'false']],
    mspace: [['mathbackground', MATH_COLOR], ['width', PLAIN_NUMBER], ['height', PLAIN_NUMBER]],
    menclose: [['notation', /^[a-z ]{1,60}$/]],
    svg: [['xmlns', 'http://www.w3.org/2000/svg'], ['width', PLAIN_NUMBER], ['height', PLAIN_NUMBER], ['viewBox', /^[\d. -]{1,60}$/], ['preserveAspectRatio', /^[a-zA-Z ]{1,30}$/], ['style', KATEX_STYLE]],
    path: [['d', /^[\d\s.,a-zA-Z-]{1,20000}$/]],
    line: [['x1', PLAIN_NUMBER], ['y1', PLAIN_NUMBER], ['x2', PLAIN_NUMBER], ['y2', PLAIN_NUMBER], ['strokeWidth', PLAIN_NUMBER]],
  },
};
