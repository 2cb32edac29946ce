import type { CatalogRecipe, RecipeCatalog } from '../../src/lib/fielddata/recipe-catalog';
import type { MatchCandidate } from '../../src/lib/fielddata/match';

/**
 * A recipe catalog over a fixed list, for unit tests of the field-data services (the API and
 * browser tests use the real recipe repository). Drafts it starts are added to the list.
 */
export function listCatalog(recipes: (CatalogRecipe & { model: MatchCandidate['model'] })[], canDraft = true): RecipeCatalog & { drafts: unknown[] } {
  const drafts: unknown[] = [];
  return {
    drafts,
    async find(slug) {
      return recipes.find((r) => r.slug === slug) ?? null;
    },
    async published() {
      return recipes.filter((r) => r.status === 'published');
    },
    async createDraft(input) {
      if (!canDraft) return null;
      drafts.push(input);
      const slug = input.title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '');
      const r = { slug, title: input.title, loopType: input.loopType, status: 'draft', url: `/recipes/${slug}`, model: null };
      recipes.push(r);
      return r;
    },
  };
}
