import type { MatchCandidate } from './match';

/** A recipe as the field-data services need it. */
export interface CatalogRecipe {
  slug: string;
  title: string;
  loopType: string;
  status: string;
  /** Path of its page. */
  url: string;
}

/**
 * The recipe book as seen from field data: the route layer hands in an implementation on the
 * recipe repository (src/lib/recipes), so these services never reach into recipe storage.
 */
export interface RecipeCatalog {
  /** A recipe the actor may see, or null. */
  find(slug: string): Promise<CatalogRecipe | null>;
  /** Published recipes with their models, for matching. */
  published(): Promise<MatchCandidate[]>;
  /** Starts a draft recipe owned by the actor; null when this installation cannot (no authored recipes). */
  createDraft(input: { title: string; summary: string; loopType: string; body: string; model: unknown; controller: unknown }): Promise<CatalogRecipe | null>;
}
