import { tempDatabase } from '../../support/temp-db';
import type { Actor } from '../../../src/lib/editorial/actor';
import type { EditorialContext, FileRecipeRef, OutgoingMail } from '../../../src/lib/editorial/context';

/** People of the Brindlewood demo, one per role. */
export const PEOPLE = {
  reader: { id: 'u-reader', email: 'tomas.reyna@brindlewood.example', name: 'Tomas Reyna', role: 'reader' },
  author: { id: 'u-author', email: 'ines.halloran@brindlewood.example', name: 'Ines Halloran', role: 'author' },
  author2: { id: 'u-author2', email: 'bram.okafor@brindlewood.example', name: 'Bram Okafor', role: 'author' },
  curator: { id: 'u-curator', email: 'greta.lindqvist@brindlewood.example', name: 'Greta Lindqvist', role: 'curator' },
  admin: { id: 'u-admin', email: 'ops.admin@brindlewood.example', name: 'Plant Admin', role: 'admin' },
} satisfies Record<string, Actor>;

/** An editorial context on a fresh database, with captured mail, index updates and a clock that ticks. */
export async function testContext(fileRecipes: Record<string, FileRecipeRef> = { 'raw-milk-transfer-flow': { title: 'Raw-milk transfer flow', status: 'published' } }) {
  const db = await tempDatabase();
  const mail: OutgoingMail[] = [];
  const indexed: string[] = [];
  let tick = Date.parse('2026-11-02T08:00:00.000Z');
  const ctx: EditorialContext = {
    knex: db.knex,
    now: () => new Date((tick += 1000)).toISOString(),
    // Reads the database like the real library does, so an operation that looks a file recipe up
    // inside its transaction (one connection) would hang here too.
    fileRecipe: async (slug) => (await db.knex.raw('select 1'), fileRecipes[slug] ?? null),
    siteUrl: 'http://loopwright.test',
    sendMail: async (m) => void mail.push(...m),
    onPublishedChange: (slug) => void indexed.push(slug),
  };
  return { ctx, mail, indexed, cleanup: db.cleanup, knex: db.knex };
}

export const DRAFT = {
  title: 'HTST hot-water temperature, PI',
  summary: 'Holds the hot-water set on the HTST heating section; PI from a bump test.',
  loopType: 'temperature' as const,
  area: 'htst' as const,
  loopTags: ['TIC-210'],
  units: { pv: '°C', mv: '% valve' },
  model: { type: 'fopdt' as const, k: 0.9, tau: 45, theta: 6 },
  controller: { form: 'ideal' as const, kc: 1.4, ti: 45 },
  body: '## When to use it\n\nOn TIC-210.\n\n<LoopResponse model={{ type: "fopdt", k: 0.9, tau: 45, theta: 6 }} controller={{ form: "ideal", kc: 1.4, ti: 45 }} />\n',
};
