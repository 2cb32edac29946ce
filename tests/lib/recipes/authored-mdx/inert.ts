/**
 * What could run or reach out in compiled HTML, as a list of findings (empty = inert). Checks
 * the markup as a browser would read it: elements that execute or load, handler attributes,
 * script-capable URLs and inline styles outside KaTeX's plain values.
 */
export function findActiveContent(html: string): string[] {
  const found: string[] = [];
  const tags = html.match(/<[a-zA-Z][^>]*>/g) ?? [];
  for (const tag of tags) {
    const name = /^<([a-zA-Z][\w:-]*)/.exec(tag)![1].toLowerCase();
    if (['script', 'iframe', 'object', 'embed', 'style', 'link', 'meta', 'base', 'form', 'img', 'image', 'foreignobject', 'use', 'animate', 'set', 'input', 'button', 'frame', 'template'].includes(name)) {
      found.push(`element <${name}>`);
    }
    for (const attr of tag.matchAll(/\s([^\s=>]+)(?:="([^"]*)")?/g)) {
      const key = attr[1].toLowerCase();
      const value = decode(attr[2] ?? '');
      if (key.startsWith('on')) found.push(`handler ${key} on <${name}>`);
      if (['href', 'src', 'action', 'formaction', 'xlink:href', 'srcdoc', 'poster', 'background'].includes(key) && !/^(?:https?:|mailto:|#|\/(?!\/))/i.test(value)) {
        found.push(`${key}="${value}" on <${name}>`);
      }
      if (key === 'style' && /url\(|expression\(|javascript:|position\s*:\s*fixed|@import/i.test(value)) found.push(`style "${value}"`);
      if (key === 'class' && /\b(?:fixed|inset-0)\b/.test(value)) found.push(`class "${value}"`);
      if (key === 'id' && !value.startsWith('user-content-')) found.push(`unprefixed id "${value}"`);
    }
  }
  return found;
}

function decode(value: string): string {
  return value
    .replace(/&#x([0-9a-f]+);?/gi, (_, h) => String.fromCodePoint(parseInt(h, 16)))
    .replace(/&#(\d+);?/g, (_, d) => String.fromCodePoint(Number(d)))
    .replace(/&quot;/g, '"').replace(/&amp;/g, '&').replace(/&lt;/g, '<').replace(/&gt;/g, '>');
}
