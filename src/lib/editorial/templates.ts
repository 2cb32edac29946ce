import type { z } from 'zod';
import { appendAudit } from '../db/audit-log';
import { listTemplateRows, upsertTemplateRow } from '../db/recipe-templates';
import { atLeast, type Actor } from './actor';
import { compileForSave } from './body';
import type { EditorialContext } from './context';
import { defaultTemplate, STARTERS } from './default-templates';
import { EditorialError, forbidden } from './errors';
import { LOOP_TYPES, type TemplateSchema } from './fields';

type LoopType = (typeof LOOP_TYPES)[number];

function checkLoopType(loopType: string): LoopType {
  if (!(LOOP_TYPES as readonly string[]).includes(loopType)) {
    throw new EditorialError(404, 'not_found', `There is no template for "${loopType}"; loop types are ${LOOP_TYPES.join(', ')}.`);
  }
  return loopType as LoopType;
}

/** The template of each loop type: the curators' version where one was saved, else the built-in one. */
export async function listTemplates(ctx: EditorialContext) {
  const saved = new Map((await listTemplateRows(ctx.knex)).map((r) => [r.loop_type, r]));
  return LOOP_TYPES.map((loopType) => {
    const row = saved.get(loopType);
    const base = row ?? defaultTemplate(loopType);
    const starter = STARTERS[loopType];
    return { loopType, title: base.title, body: base.body, units: starter.units, model: starter.model, controller: starter.controller, updatedAt: row?.updated_at ?? null, updatedBy: row?.updated_by ?? null, builtIn: !row };
  });
}

export async function getTemplate(ctx: EditorialContext, loopType: string) {
  const lt = checkLoopType(loopType);
  return (await listTemplates(ctx)).find((t) => t.loopType === lt)!;
}

/** Curators change a loop type's template; its body must pass the same checks as a recipe's. */
export async function saveTemplate(ctx: EditorialContext, actor: Actor, loopType: string, input: z.infer<typeof TemplateSchema>) {
  if (!atLeast(actor, 'curator')) throw forbidden('Only curators and admins change templates.');
  const lt = checkLoopType(loopType);
  await compileForSave(input.body);
  const now = ctx.now();
  await ctx.knex.transaction(async (trx) => {
    await upsertTemplateRow(trx, { loop_type: lt, title: input.title, body: input.body, updated_at: now, updated_by: actor.email });
    await appendAudit(trx, { at: now, actor_id: actor.id, actor_email: actor.email, action: 'template', recipe_slug: null, from_status: null, to_status: null, revision: null, comment: `Template for ${lt} loops changed` });
  });
  return getTemplate(ctx, lt);
}

