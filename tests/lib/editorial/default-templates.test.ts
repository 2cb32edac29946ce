import { describe, expect, it } from 'vitest';
import { defaultTemplate } from '../../../src/lib/editorial/default-templates';
import { LOOP_TYPES } from '../../../src/lib/editorial/fields';
import { compileBody } from '../../../src/lib/recipes/authored-mdx/compile';

describe('defaultTemplate', () => {
  it.each([...LOOP_TYPES])('gives %s loops a body that passes the authored-MDX checks, with the safety cautions and a calculator', (loopType) => {
    const { body } = defaultTemplate(loopType);
    const result = compileBody(body);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.islands.map((i) => i.name)).toEqual(['LoopResponse', 'FrequencyView']);
    expect(body).toContain('Test in manual first');
    expect(body).toMatch(/## Commissioning steps/);
  });
});
