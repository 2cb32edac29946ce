import { z } from 'zod';
import { LOOP_TYPES, RECIPE_STATUSES } from './vocabulary';

/** A recipe's rating: mean stars (null before the first rating) and how many ratings. */
const ApiRatingSchema = z.object({ average: z.number().nullable(), count: z.int().min(0) });

/**
 * A recipe as `GET /api/v1/recipes` and `GET /api/v1/recipes/{slug}` answer it (shared/api-v1.md):
 * the contract's keys, typed; more keys may follow (the contract lets fields be added).
 * `retiredReason` and `supersededBy` are present on retired recipes only.
 */
export const ApiRecipeSchema = z
  .looseObject({
    /** URL name, e.g. htst-product-temperature-cascade. */
    slug: z.string(),
    title: z.string(),
    summary: z.string(),
    loopType: z.enum(LOOP_TYPES),
    status: z.enum(RECIPE_STATUSES),
    /** Revision number, from 1. */
    revision: z.int().min(1),
    /** The MDX body as written. */
    body: z.string(),
    /** The process model (fopdt, sopdt, ipdt or transfer function; times in s). */
    model: z.record(z.string(), z.unknown()),
    /** The controller: form and kc, ti, td (s). */
    controller: z.record(z.string(), z.unknown()),
    /** The performance claims the build re-checks. */
    claims: z.array(z.record(z.string(), z.unknown())),
    ownerEmail: z.string(),
    /** ISO 8601 time of the last change (a file recipe: its review date). */
    updatedAt: z.string(),
    rating: ApiRatingSchema,
    /** Where it lives: a content file or the editor. */
    source: z.enum(['file', 'authored']),
    /** Its page, /recipes/{slug}. */
    url: z.string(),
    /** Why it was retired (retired recipes only). */
    retiredReason: z.string().nullable().optional(),
    /** The slug of the recipe that replaces it, or null (retired recipes only). */
    supersededBy: z.string().nullable().optional(),
  })
  .meta({ id: 'Recipe' });

export type ApiRecipeShape = z.output<typeof ApiRecipeSchema>;
