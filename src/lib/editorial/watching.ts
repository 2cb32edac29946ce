import { addWatcher, isWatching, removeWatcher, watcherCount } from '../db/recipe-watchers';
import type { Actor } from './actor';
import type { EditorialContext } from './context';
import { findTarget } from './target';

/** Starts or stops `actor` watching a recipe; answers whether they watch it now. */
export async function setWatching(ctx: EditorialContext, actor: Actor, slug: string, watch: boolean) {
  await findTarget(ctx, actor, slug);
  if (watch) await addWatcher(ctx.knex, slug, actor, ctx.now());
  else await removeWatcher(ctx.knex, slug, actor.id);
  return watchState(ctx, actor, slug);
}

export async function watchState(ctx: EditorialContext, actor: Actor, slug: string) {
  await findTarget(ctx, actor, slug);
  return { slug, watching: await isWatching(ctx.knex, slug, actor.id), watchers: await watcherCount(ctx.knex, slug) };
}
