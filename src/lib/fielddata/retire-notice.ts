/** The e-mails owners of loops get when the recipe their loops follow is retired. */
import type { Loop } from '../schemas/loop';
import { describeSetting } from './tuning-setting';

/** What retiring said: the recipe, why, and what replaces it. */
export interface RetiredRecipe {
  slug: string;
  title: string;
  reason: string;
  supersededBy: string | null;
  retiredBy: string;
  /** Absolute URL of the site, for links. */
  siteUrl: string;
}

/** One plain-text message per owner, listing that owner's loops (by tag). */
export function retireNotices(recipe: RetiredRecipe, loops: Loop[]): { to: string; subject: string; text: string }[] {
  const byOwner = new Map<string, Loop[]>();
  for (const l of loops) byOwner.set(l.ownerEmail, [...(byOwner.get(l.ownerEmail) ?? []), l]);
  return [...byOwner.entries()].map(([to, own]) => ({
    to,
    subject: `Recipe retired: ${recipe.title} (${own.length === 1 ? own[0].tag : `${own.length} of your loops`})`.slice(0, 200),
    text: [
      'Hello,',
      '',
      `${recipe.retiredBy} has retired the recipe "${recipe.title}". The reason given:`,
      `  ${recipe.reason}`,
      '',
      recipe.supersededBy ? `It is superseded by: ${recipe.siteUrl}/recipes/${recipe.supersededBy}` : 'No recipe supersedes it yet.',
      '',
      `These loops you own still follow it:`,
      ...own.map((l) => `  ${l.tag} (${l.area})${l.description ? ` – ${l.description}` : ''}${l.tuning ? `; left at ${describeSetting(l.tuning)}` : ''}`),
      '',
      'Nothing in the plant changes by itself. Review each loop against the new recipe, and update',
      `its entry in the register: ${recipe.siteUrl}/loops`,
      'Before changing a running loop, follow site procedures: test in manual first, keep interlocks',
      'and the safety system in service, and treat pasteurizer hold temperatures as legal limits.',
    ].join('\n'),
  }));
}
