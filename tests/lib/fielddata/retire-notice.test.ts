import { describe, expect, it } from 'vitest';
import { retireNotices } from '../../../src/lib/fielddata/retire-notice';
import type { Loop } from '../../../src/lib/schemas/loop';

const loop = (tag: string, ownerEmail: string): Loop => ({
  id: 1, tag, area: 'htst', description: '', recipeSlug: 'old', ownerEmail, commissionedAt: null, commissionedBy: null,
  tuning: { form: 'ideal', gain: 2, integral: 40, derivative: null, timeUnit: 's', gainUnit: '%/%' }, evidenceIds: [], createdAt: '', updatedAt: '',
});

describe('retireNotices', () => {
  const recipe = { slug: 'old', title: 'Old hot-water loop', reason: 'Valve replaced', supersededBy: 'new-hot-water', retiredBy: 'Dana Pryce', siteUrl: 'http://plant.example' };

  it('writes one message per owner naming each of their loops and the replacement', () => {
    const mails = retireNotices(recipe, [loop('TIC-210', 'a@x.example'), loop('TIC-211', 'b@x.example'), loop('TIC-212', 'a@x.example')]);
    expect(mails.map((m) => [m.to, m.subject])).toEqual([
      ['a@x.example', 'Recipe retired: Old hot-water loop (2 of your loops)'],
      ['b@x.example', 'Recipe retired: Old hot-water loop (TIC-211)'],
    ]);
    expect(mails[0].text).toContain('  TIC-210 (htst); left at Kc 2 %/%, Ti 40 s, Td 0 s (ideal)\n  TIC-212');
    expect(mails[0].text).toContain('It is superseded by: http://plant.example/recipes/new-hot-water');
    expect(mails[0].text).toContain('test in manual first');
  });

  it('sends nothing when no loop follows the recipe', () => {
    expect(retireNotices(recipe, [])).toEqual([]);
  });
});
