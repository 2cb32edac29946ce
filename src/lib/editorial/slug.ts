/** A slug from a title: lower-case ASCII words joined by hyphens, at most 80 characters. */
export function slugFromTitle(title: string): string {
  const base = title
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80)
    .replace(/-+$/, '');
  return base || 'recipe';
}

/** Slugs that would hide a page of the site under /recipes/. */
const RESERVED = new Set(['new']);

/** The first of `base`, `base-2`, `base-3`, … that `taken` says is free. */
export async function uniqueSlug(base: string, taken: (slug: string) => Promise<boolean>): Promise<string> {
  if (!RESERVED.has(base) && !(await taken(base))) return base;
  for (let n = 2; ; n++) {
    const candidate = `${base}-${n}`;
    if (!(await taken(candidate))) return candidate;
  }
}
