/**
 * The readable words of an MDX body for the search index: imports, exports, components,
 * formulas and Markdown punctuation removed, words and numbers kept.
 */
export function plainText(mdx: string): string {
  return mdx
    .replace(/^\s*(import|export)\s.*$/gm, ' ')
    .replace(/\$\$[\s\S]*?\$\$/g, ' ')
    .replace(/\$[^$\n]+\$/g, ' ')
    .replace(/<[A-Za-z][^>]*\/>/g, ' ')
    .replace(/<\/?[A-Za-z][^>]*>/g, ' ')
    .replace(/\{\/\*[\s\S]*?\*\/\}/g, ' ')
    .replace(/!?\[([^\]]*)\]\([^)]*\)/g, '$1')
    .replace(/[#*_`>|~]/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
}
