import { describe, expect, it } from 'vitest';
import { compileBody } from '../../../../src/lib/recipes/authored-mdx/compile';
import { splitIslands } from '../../../../src/lib/recipes/authored-mdx/islands-in-html';

describe('splitIslands', () => {
  it('gives back the HTML around each calculator and its props exactly as validated', () => {
    const result = compileBody('# Before\n\n<PidConverter controller={{ form: "ideal", kc: 1.5, ti: 20 }} title={"Gain & \\"reset\\" <x>"} />\n\nAfter.');
    if (!result.ok) throw new Error('should compile');
    const segments = splitIslands(result.html);
    expect(segments.map((s) => s.kind)).toEqual(['html', 'island', 'html']);
    expect(segments[1]).toEqual({ kind: 'island', name: 'PidConverter', props: result.islands[0].props });
    expect(segments[1]).toMatchObject({ props: { title: 'Gain & "reset" <x>' } });
    expect(segments[0]).toEqual({ kind: 'html', html: '<h1>Before</h1>\n' });
  });

  it('leaves a placeholder with a name outside the whitelist as inert HTML', () => {
    const html = '<div class="authored-island" data-island="Script" data-props="{}"><p class="island-fallback">x</p></div>';
    expect(splitIslands(html)).toEqual([{ kind: 'html', html }]);
  });
});
