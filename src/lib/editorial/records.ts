import type { Knex } from 'knex';
import { listRecipesWithRevisions, type AuthoredRecipeWithRevision } from '../db/authored-recipes';
import type { RecipeFrontmatter } from '../recipes/frontmatter';
import type { RecipeRecord } from '../recipes/record';
import { frontmatterOf } from './view';

/**
 * An authored recipe as the recipe library sees it (the same record as a file recipe). A draft
 * may not have every frontmatter field yet; the ones it lacks read as neutral defaults, and
 * `model`/`controller` stay null until written (pages show the loop summary only with both).
 */
export function authoredRecord(row: AuthoredRecipeWithRevision): RecipeRecord {
  const fm = frontmatterOf(row);
  const retired = row.status === 'retired';
  const pid = fm.controller && 'td' in fm.controller && (fm.controller.td ?? 0) > 0;
  const data = {
    loopTags: [],
    tags: [],
    cautions: [],
    claims: [],
    commissioning: [],
    units: { pv: '', mv: '' },
    modelSource: 'stated in the body',
    structure: pid ? 'PID' : 'PI',
    tuningRule: { rule: 'field' },
    changesRunningLoop: true,
    ...fm,
    model: fm.model ?? null,
    controller: fm.controller ?? null,
    owner: { name: row.owner_name, email: row.owner_email },
    reviewed: (row.reviewed_at ?? row.created_at).slice(0, 10),
    revision: row.current_revision,
    status: row.status,
    ...(retired ? { retiredReason: row.retired_reason ?? 'Retired.', ...(row.superseded_by ? { supersededBy: row.superseded_by } : {}) } : {}),
  } as unknown as RecipeFrontmatter;
  return { slug: row.slug, source: 'authored', data, body: row.revision.body, updatedAt: row.updated_at, html: row.revision.html };
}

/** Every authored recipe, in every status (the library filters by who may see what). */
export async function authoredRecords(knex: Knex): Promise<RecipeRecord[]> {
  if (!(await knex.schema.hasTable('recipes'))) return [];
  return (await listRecipesWithRevisions(knex)).map(authoredRecord);
}
