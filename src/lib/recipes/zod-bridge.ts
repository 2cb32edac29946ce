import type { z as z4 } from 'zod';

/** The part of a zod-3 refinement context the bridge uses (astro/zod is zod 3.25). */
export interface Zod3Context {
  addIssue(issue: { code: 'custom'; message: string; path?: (string | number)[] }): void;
}

/**
 * Validates with a zod 4 schema inside an astro/zod (zod 3) transform, copying every issue with
 * its path, so the shared concept schemas stay the one source of truth for content frontmatter.
 * Returns the parsed value, or null after reporting the issues (zod 3 then fails the parse).
 */
export function bridgeParse<S extends z4.ZodType>(schema: S, value: unknown, ctx: Zod3Context): z4.output<S> | null {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  for (const issue of result.error.issues) {
    ctx.addIssue({ code: 'custom', message: issue.message, path: issue.path.map((p) => (typeof p === 'symbol' ? String(p) : p)) });
  }
  return null;
}
