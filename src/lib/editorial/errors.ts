/** A refusal the API answers as `{ error: { code, message, field? } }` with `status`. */
export class EditorialError extends Error {
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409,
    readonly code: string,
    message: string,
    readonly field: string | null = null,
    /** Extra top-level keys of the answer, e.g. `current` for a conflict. */
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export const notFound = (slug: string) => new EditorialError(404, 'not_found', `There is no recipe "${slug}" that you can see.`);
export const forbidden = (message: string) => new EditorialError(403, 'forbidden', message);
export const readOnly = (slug: string) =>
  new EditorialError(409, 'read_only', `"${slug}" is a file recipe: change it in the repository (content/recipes/${slug}.mdx), not through the API.`);
