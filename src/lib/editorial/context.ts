import type { Knex } from 'knex';

/** What the editorial flow needs to know of a file recipe. */
export interface FileRecipeRef {
  title: string;
  status: string;
}

/** One e-mail to send once the change it tells of has been committed. */
export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
}

/**
 * What the editorial operations need from the rest of the app, passed in so that they can be
 * tested on a temporary database: the database, the clock, the file recipes, the site's
 * address for links in e-mails, and hooks run after a commit (search index, mail).
 */
export interface EditorialContext {
  knex: Knex;
  /** Current time, ISO 8601. */
  now(): string;
  /** The file recipe (content/recipes) with this slug, or null. */
  fileRecipe(slug: string): FileRecipeRef | null | Promise<FileRecipeRef | null>;
  /** Base URL for links in e-mails, e.g. https://loopwright.brindlewood.example */
  siteUrl: string;
  /** Sends mail after commit; failures are logged, never undo the change. */
  sendMail(messages: OutgoingMail[]): Promise<void>;
  /** A recipe became, stayed or stopped being published (update the search index). */
  onPublishedChange(slug: string): void | Promise<void>;
}

/** Runs the after-commit hooks of an operation without letting them fail it. */
export async function afterCommit(ctx: EditorialContext, mail: OutgoingMail[], changedSlug: string | null): Promise<void> {
  try {
    if (changedSlug) await ctx.onPublishedChange(changedSlug);
  } catch (err) {
    console.error('Search index update failed:', err instanceof Error ? err.message : err);
  }
  if (mail.length === 0) return;
  try {
    await ctx.sendMail(mail);
  } catch (err) {
    console.error('Mail delivery failed:', err instanceof Error ? err.message : err);
  }
}
