import type { RecipeFrontmatter } from './frontmatter';

/** Average stars and how many people rated; average null when nobody has. */
export interface Rating {
  average: number | null;
  count: number;
}

/** A recipe as the rest of the app sees it, whether it came from a file or the editor. */
export interface RecipeRecord {
  slug: string;
  /** Where it lives: a file in content/recipes, or written in the browser. */
  source: 'file' | 'authored';
  data: RecipeFrontmatter;
  /** The MDX body, frontmatter excluded. */
  body: string;
  /** ISO timestamp of the last change. */
  updatedAt: string;
  /** For an authored recipe: its body compiled and sanitized at save time (src/lib/recipes/authored-mdx). */
  html?: string;
}

/** The path of a recipe's page. */
export function recipeUrl(slug: string): string {
  return `/recipes/${slug}`;
}

/** A file recipe: its revision is the frontmatter's, its last change the review date. */
export function fileRecord(slug: string, data: RecipeFrontmatter, body: string): RecipeRecord {
  return { slug, source: 'file', data, body, updatedAt: `${data.reviewed}T00:00:00.000Z` };
}
