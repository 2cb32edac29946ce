import { describe, expect, it } from 'vitest';
import { checkRecipeEntry } from '../../../src/lib/recipes/content-entry';
import { BASE_FRONTMATTER } from './make-record';

function collect(value: unknown) {
  const issues: { message: string; path?: (string | number)[] }[] = [];
  const data = checkRecipeEntry(value, { addIssue: (i) => issues.push(i) });
  return { data, issues };
}

describe('checkRecipeEntry', () => {
  it('accepts a valid recipe whose claims hold', () => {
    const { data, issues } = collect({ ...BASE_FRONTMATTER, claims: [{ metric: 'ms', op: '<=', value: 1.3 }] });
    expect(issues).toEqual([]);
    expect(data?.title).toBe(BASE_FRONTMATTER.title);
  });

  it('stops the build on a claim that does not hold, naming the recipe and the claim', () => {
    // The lambda-tuned flow loop has Ms ≈ 1.16 (|1 + L| minimum at the gain crossover region);
    // promising Ms ≤ 1.05 must fail.
    const { data, issues } = collect({ ...BASE_FRONTMATTER, title: 'Broken promise', claims: [{ metric: 'ms', op: '<=', value: 1.05 }] });
    expect(data).toBeNull();
    expect(issues).toHaveLength(1);
    expect(issues[0].path).toEqual(['claims']);
    expect(issues[0].message).toMatch(/Recipe "Broken promise": loop claim "Peak sensitivity Ms ≤ 1.05" does not hold — the engine computes 1.16/);
  });

  it('reports schema problems with their paths before any claim is checked', () => {
    const { data, issues } = collect({ ...BASE_FRONTMATTER, loopTags: ['tic 210'], status: 'retired' });
    expect(data).toBeNull();
    expect(issues.map((i) => i.path?.join('.'))).toEqual(expect.arrayContaining(['loopTags.0', 'retiredReason']));
  });
});

describe('checkRecipeEntry with a chain of blocks', () => {
  // Series connection multiplies transfer functions and adds dead times (any control text, e.g.
  // Seborg et al., Process Dynamics and Control, block-diagram algebra — common practice).
  const chained = {
    ...BASE_FRONTMATTER,
    model: { type: 'tf', num: [-0.3], den: [120, 43, 1], delay: 6 },
    sensor: { num: [1], den: [8, 1] },
    controller: { form: 'ideal', kc: -4.4, ti: 42 },
    chain: {
      blocks: [
        { kind: 'first-order', k: 1, tau: 3 },
        { kind: 'first-order', k: -0.3, tau: 40 },
        { kind: 'dead-time', theta: 6 },
      ],
      sensor: { kind: 'first-order', k: 1, tau: 8 },
    },
  };

  it('accepts blocks that multiply out to the model and sensor', () => {
    expect(collect(chained).issues).toEqual([]);
  });

  it('refuses blocks that do not, naming the recipe', () => {
    const wrong = { ...chained, title: 'Wrong chain', chain: { ...chained.chain, blocks: chained.chain.blocks.slice(0, 2) } };
    const { data, issues } = collect(wrong);
    expect(data).toBeNull();
    expect(issues.map((i) => i.path?.[0])).toEqual(['chain']);
    expect(issues[0].message).toMatch(/Recipe "Wrong chain": its blocks multiply out to .* delay 0 s, which is not its model/);
  });
});
