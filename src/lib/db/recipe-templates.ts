import type { Knex } from 'knex';

export interface TemplateRow {
  loop_type: string;
  title: string;
  body: string;
  updated_at: string;
  updated_by: string;
}

export function listTemplateRows(knex: Knex): Promise<TemplateRow[]> {
  return knex<TemplateRow>('recipe_templates').orderBy('loop_type');
}

export function findTemplateRow(knex: Knex, loopType: string): Promise<TemplateRow | undefined> {
  return knex<TemplateRow>('recipe_templates').where({ loop_type: loopType }).first();
}

export async function upsertTemplateRow(knex: Knex, row: TemplateRow): Promise<void> {
  await knex('recipe_templates').insert(row).onConflict('loop_type').merge();
}
