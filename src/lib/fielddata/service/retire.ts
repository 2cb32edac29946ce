import type { Knex } from 'knex';
import { listLoops } from '../../db/loops';
import { retireNotices, type RetiredRecipe } from '../retire-notice';

/**
 * The messages to the owners of loops that still follow a recipe being retired, for the
 * editorial flow to send after its commit (one per owner; none when no loop follows it).
 */
export async function loopOwnerNotices(knex: Knex, recipe: RetiredRecipe): Promise<{ to: string; subject: string; text: string }[]> {
  return retireNotices(recipe, await listLoops(knex, { recipe: recipe.slug }));
}
