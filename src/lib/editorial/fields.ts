import { z } from 'zod';
import { ClaimSchema, PidControllerSchema, ProcessModelSchema, TransferFunctionSchema } from '../schemas';
import { BODY_LIMITS } from '../recipes/authored-mdx/limits';
import { LoopTagSchema, LoopUnitsSchema, TuningRuleRefSchema } from '../recipes/schema';
import { AREA_CODES, LOOP_TYPES } from '../recipes/vocabulary';

export { LOOP_TYPES };

/**
 * The fields of an authored recipe that its author writes (the workflow fields — status,
 * revision, owner, review and retirement — are kept by the server). A draft may be incomplete;
 * the body is checked by the safe-MDX compiler, not here.
 */
export const AuthoredFieldsSchema = z.object({
  /** Headline, e.g. "Raw-milk transfer flow, PI on a mag meter". */
  title: z.string().trim().min(3, 'Give the recipe a title of at least 3 characters.').max(120, 'Keep the title under 120 characters.'),
  /** One or two sentences: which loops it serves and why it works. */
  summary: z.string().trim().min(10, 'Write a summary of at least 10 characters.').max(400, 'Keep the summary under 400 characters.'),
  /** What the loop controls. */
  loopType: z.enum(LOOP_TYPES, { message: `loopType is one of ${LOOP_TYPES.join(', ')}.` }),
  /** The MDX body (Markdown plus the calculator components with literal props). */
  body: z.string().max(BODY_LIMITS.maxBytes, `The body is limited to ${BODY_LIMITS.maxBytes / 1024} KB.`),
  /** The process model (times in s). */
  model: ProcessModelSchema.optional(),
  /** The controller in one of the contract's forms (times in s). */
  controller: PidControllerSchema.optional(),
  /** Performance claims. */
  claims: z.array(ClaimSchema).max(40).optional(),
  /** Measurement path H(s). */
  sensor: TransferFunctionSchema.optional(),
  /** How the controller was tuned: the rule, its design time (s) and any note. */
  tuningRule: TuningRuleRefSchema.extend({ note: z.string().trim().max(400, 'Keep the tuning note under 400 characters.').optional() }).optional(),
  /** Where the model's numbers came from (step test, design data, vendor sheet). */
  modelSource: z.string().trim().min(3, 'Say in at least 3 characters where the model came from.').max(400, 'Keep the model source under 400 characters.').optional(),
  /** Process-area code of the plant, e.g. "htst" (the file recipes' codes). */
  area: z.enum(AREA_CODES, { message: `area is one of ${AREA_CODES.join(', ')}.` }).optional(),
  /** Units of the measurement (pv) and controller output (mv), e.g. °C and % valve. */
  units: LoopUnitsSchema.optional(),
  /** ISA-5.1 tags of the loops it serves, e.g. ["TIC-210"]. */
  loopTags: z.array(LoopTagSchema).max(40).optional(),
  /** Free keywords for search. */
  tags: z.array(z.string().trim().min(1).max(40)).max(40).optional(),
  /** Cautions particular to this loop, shown with the standard ones. */
  cautions: z.array(z.string().trim().min(3).max(400)).max(20).optional(),
});

export type AuthoredFields = z.infer<typeof AuthoredFieldsSchema>;

/** POST /api/v1/recipes: a new draft. */
export const CreateRecipeSchema = AuthoredFieldsSchema.extend({
  /** A short note on this first revision. */
  message: z.string().trim().max(200).optional(),
});

/** PUT /api/v1/recipes/{slug}: the revision the change is based on and the fields to change. */
export const UpdateRecipeSchema = AuthoredFieldsSchema.partial().extend({
  /** The revision the editor started from; a stale one answers 409 conflict. */
  baseRevision: z.number({ message: 'Give baseRevision: the revision your change is based on.' }).int().min(1),
  /** What changed, in a few words ("ti from field test"). */
  message: z.string().trim().max(200).optional(),
  /** null removes the sensor (ideal measurement again); absent keeps it. */
  sensor: AuthoredFieldsSchema.shape.sensor.unwrap().nullable().optional(),
  /** null removes the tuning rule (not stated yet); absent keeps it. */
  tuningRule: AuthoredFieldsSchema.shape.tuningRule.unwrap().nullable().optional(),
  /** null removes the model source; absent keeps it. */
  modelSource: AuthoredFieldsSchema.shape.modelSource.unwrap().nullable().optional(),
});

/** POST …/return. */
export const ReturnSchema = z.object({
  /** What the author should change. */
  comment: z.string().trim().min(3, 'Say what the author should change (at least 3 characters).').max(4000),
});

/** POST …/retire. */
export const RetireSchema = z.object({
  /** Why it no longer holds. */
  reason: z.string().trim().min(3, 'Give the reason for retiring it (at least 3 characters).').max(2000),
  /** Slug of the recipe that replaces it. */
  supersededBy: z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'supersededBy is the slug of the recipe that replaces it.').optional(),
});

/** PUT …/rating. */
export const RatingSchema = z.object({
  /** Whole stars, 1 to 5. */
  stars: z.number({ message: 'stars is a whole number from 1 to 5.' }).int('stars is a whole number from 1 to 5.').min(1, 'stars is a whole number from 1 to 5.').max(5, 'stars is a whole number from 1 to 5.'),
  /** A field note: what happened when it was used on the plant. */
  note: z.string().trim().max(2000, 'Keep a field note under 2000 characters.').optional(),
});

/** PUT /api/v1/templates/{loopType}. */
export const TemplateSchema = z.object({
  title: z.string().trim().min(3).max(120),
  body: z.string().max(BODY_LIMITS.maxBytes),
});
