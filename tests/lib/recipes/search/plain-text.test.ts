import { describe, expect, it } from 'vitest';
import { plainText } from '../../../../src/lib/recipes/search/plain-text';

describe('plainText', () => {
  it('keeps words and drops imports, components, formulas and Markdown marks', () => {
    const mdx = [
      "import LoopResponse from '../../src/components/calculators/LoopResponse';",
      '## When to use it',
      'Use **PI** on the $K_c$ flow loop, see [the valve](/valves).',
      '$$',
      'G(s) = \\frac{K}{\\tau s + 1}',
      '$$',
      '<LoopResponse client:visible model={frontmatter.model} />',
    ].join('\n');
    expect(plainText(mdx)).toBe('When to use it Use PI on the flow loop, see the valve.');
  });
});
