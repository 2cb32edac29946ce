import type { Rating, RecipeRecord } from './record';
import { recipeUrl } from './record';

/** A recipe as `GET /api/v1/recipes` and `GET /api/v1/recipes/{slug}` answer it (shared/api-v1.md). */
export function toApiRecipe(record: RecipeRecord, rating: Rating) {
  const d = record.data;
  return {
    slug: record.slug,
    title: d.title,
    summary: d.summary,
    loopType: d.loopType,
    status: d.status,
    revision: d.revision,
    body: record.body,
    model: d.model,
    controller: d.controller,
    claims: d.claims,
    ownerEmail: d.owner.email,
    updatedAt: record.updatedAt,
    rating,
    source: record.source,
    url: recipeUrl(record.slug),
    ...(d.status === 'retired' ? { retiredReason: d.retiredReason ?? null, supersededBy: d.supersededBy ?? null } : {}),
    // Beyond the contract's minimum:
    area: d.area,
    loopTags: d.loopTags,
    tags: d.tags,
    structure: d.structure,
    units: d.units,
    sensor: d.sensor ?? null,
    innerLoop: d.innerLoop ?? null,
    tuningRule: d.tuningRule,
    ownerName: d.owner.name,
    reviewed: d.reviewed,
    cautions: d.cautions,
  };
}

export type ApiRecipe = ReturnType<typeof toApiRecipe>;
