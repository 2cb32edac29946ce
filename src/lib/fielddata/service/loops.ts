/** The loop register: validation against areas and recipes, create, replace, delete, import, export. */
import type { Knex } from 'knex';
import { z } from 'zod';
import { deleteLoop, findLoop, insertLoop, listLoops, updateLoop, type LoopFilter } from '../../db/loops';
import { evidenceOfLoop } from '../../db/evidence';
import { IsoDateSchema, LoopInputSchema, LoopTagSchema, type Loop, type LoopInput } from '../../schemas/loop';
import { loopsToCsv, readLoopsCsv } from '../loops-csv';
import { FieldDataProblem, fromZod, invalid, invalidFile, missing } from '../problem';
import type { RecipeCatalog } from '../recipe-catalog';

/** Query of GET /api/v1/loops; all optional. */
export const LoopQuerySchema = z.object({
  /** Plant area code. */
  area: z.string().trim().min(1).optional(),
  /** Recipe slug the loops follow. */
  recipe: z.string().trim().min(1).optional(),
  /** Tuning left before this date (YYYY-MM-DD): "tuning older than". */
  tunedBefore: IsoDateSchema.optional(),
  /** Tuning left on or after this date. */
  tunedSince: IsoDateSchema.optional(),
  /** "true": only loops with no commissioning date. */
  untuned: z.enum(['true', 'false']).optional().transform((v) => v === 'true'),
});

export async function queryLoops(knex: Knex, query: Record<string, string>): Promise<Loop[]> {
  const q = LoopQuerySchema.safeParse(query);
  if (!q.success) throw fromZod(q.error);
  const filter: LoopFilter = { ...q.data, untuned: q.data.untuned || undefined };
  return listLoops(knex, filter);
}

/** One loop with its evidence. */
export async function getLoop(knex: Knex, tag: string) {
  const loop = await findLoop(knex, normalTag(tag));
  if (!loop) throw missing(`There is no loop ${tag} in the register.`);
  return { loop, evidence: await evidenceOfLoop(knex, loop.id) };
}

export async function createLoop(knex: Knex, body: unknown, catalog: RecipeCatalog): Promise<Loop> {
  const input = await validLoop(knex, body, catalog);
  if (await findLoop(knex, input.tag)) throw new FieldDataProblem(409, 'conflict', `The loop ${input.tag} is already in the register; change it there.`, 'tag');
  return insertLoop(knex, input);
}

export async function replaceLoop(knex: Knex, tag: string, body: unknown, catalog: RecipeCatalog): Promise<Loop> {
  const current = normalTag(tag);
  if (!(await findLoop(knex, current))) throw missing(`There is no loop ${tag} in the register.`);
  const input = await validLoop(knex, body, catalog);
  if (input.tag !== current && (await findLoop(knex, input.tag))) {
    throw new FieldDataProblem(409, 'conflict', `The tag ${input.tag} is already used by another loop.`, 'tag');
  }
  return (await updateLoop(knex, current, input))!;
}

export async function removeLoop(knex: Knex, tag: string): Promise<void> {
  if (!(await deleteLoop(knex, normalTag(tag)))) throw missing(`There is no loop ${tag} in the register.`);
}

/** The register (or a filtered part) as CSV text. */
export async function exportLoops(knex: Knex, query: Record<string, string>): Promise<string> {
  return loopsToCsv(await queryLoops(knex, query));
}

/** Imports a register file: every row valid or nothing written; existing tags are replaced. */
export async function importLoops(knex: Knex, bytes: Uint8Array, catalog: RecipeCatalog): Promise<{ created: string[]; updated: string[] }> {
  const read = readLoopsCsv(bytes);
  if (!read.ok) throw invalidFile(read.issues, read.issues.length);
  const areas = new Set<string>(await knex('plant_areas').pluck('code'));
  const issues = [];
  for (const { line, loop } of read.loops) {
    if (!areas.has(loop.area)) issues.push({ line, column: null, message: `Line ${line}: unknown plant area "${loop.area}"; use one of ${[...areas].sort().join(', ')}.` });
    else if (loop.recipeSlug && !(await catalog.find(loop.recipeSlug))) {
      issues.push({ line, column: null, message: `Line ${line}: there is no recipe "${loop.recipeSlug}".` });
    }
  }
  if (issues.length) throw invalidFile(issues, issues.length);
  const created: string[] = [];
  const updated: string[] = [];
  await knex.transaction(async (trx) => {
    for (const { loop } of read.loops) {
      if (await findLoop(trx, loop.tag)) {
        await updateLoop(trx, loop.tag, loop);
        updated.push(loop.tag);
      } else {
        await insertLoop(trx, loop);
        created.push(loop.tag);
      }
    }
  });
  return { created, updated };
}

async function validLoop(knex: Knex, body: unknown, catalog: RecipeCatalog): Promise<LoopInput> {
  const parsed = LoopInputSchema.safeParse(body);
  if (!parsed.success) throw fromZod(parsed.error);
  const input = parsed.data;
  if (!(await knex('plant_areas').where({ code: input.area }).first())) {
    const codes = (await knex('plant_areas').orderBy('code').pluck('code')).join(', ');
    throw invalid(`Unknown plant area "${input.area}"; use one of ${codes}.`, 'area');
  }
  if (input.recipeSlug && !(await catalog.find(input.recipeSlug))) {
    throw invalid(`There is no recipe "${input.recipeSlug}"; leave recipeSlug empty or name an existing recipe.`, 'recipeSlug');
  }
  return input;
}

function normalTag(tag: string): string {
  const parsed = LoopTagSchema.safeParse(decodeURIComponent(tag));
  if (!parsed.success) throw missing(`There is no loop ${tag} in the register.`);
  return parsed.data;
}
