import { db } from '../db';
import { sendMail } from '../mail/mailer';
import { findRecipe } from '../recipes/library';
import { addOrReplace, remove } from '../recipes/search/shared';
import type { EditorialContext } from './context';

/** The editorial context of a request in the running server: its database, mailer, recipe library and search index. */
export function serverContext(request: Request): EditorialContext {
  return {
    knex: db(),
    now: () => new Date().toISOString(),
    async fileRecipe(slug) {
      const record = await findRecipe(slug);
      return record && record.source === 'file' ? { title: record.data.title, status: record.data.status } : null;
    },
    siteUrl: process.env.BETTER_AUTH_URL?.trim() || new URL(request.url).origin,
    async sendMail(messages) {
      for (const m of messages) await sendMail(m);
    },
    // Findable (or gone) as soon as the publish or retire call answers.
    async onPublishedChange(slug) {
      const record = await findRecipe(slug);
      if (record) await addOrReplace(record);
      else await remove(slug);
    },
  };
}
