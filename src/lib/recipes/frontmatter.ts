import { z } from 'zod';
import { CheckedLoopSchema, InnerLoopSchema, ModelChainSchema, IsoDateSchema, LoopTagSchema, LoopUnitsSchema, OwnerSchema, TuningRuleRefSchema } from './schema';
import { AREA_CODES, LOOP_TYPES, RECIPE_STATUSES, STRUCTURES } from './vocabulary';

const slug = z.string().regex(/^[a-z0-9]+(?:-[a-z0-9]+)*$/, 'A slug is lower-case words joined by hyphens.');

/**
 * A recipe's frontmatter: one schema for file recipes (through content.config.ts), the authored
 * recipe editor's form and API bodies. Times are in s, gains are plain ratios in `units`.
 */
export const RecipeFrontmatterSchema = CheckedLoopSchema.extend({
  /** Headline, e.g. "Raw-milk transfer flow, PI on a mag meter". */
  title: z.string().min(3).max(120),
  /** One or two sentences: which loops it serves and why it works. */
  summary: z.string().min(10).max(400),
  /** What the loop controls. */
  loopType: z.enum(LOOP_TYPES),
  /** Process-area code of the plant (silos, htst, cip, boiler, glycol, wastewater, packaging). */
  area: z.enum(AREA_CODES),
  /** ISA-5.1 tags of the loops the recipe serves, e.g. ["FIC-101", "FIC-102"]. */
  loopTags: z.array(LoopTagSchema).min(1, 'Name at least one loop the recipe serves.'),
  /** Free keywords for search, e.g. ["mag meter", "centrifugal pump"]. */
  tags: z.array(z.string().min(1)).default([]),
  /** Units of the model and controller (PV and MV); kc is MV units per PV unit. */
  units: LoopUnitsSchema,
  /** Where the model's numbers came from (step test, design data, vendor sheet). */
  modelSource: z.string().min(3),
  /** The blocks the model was built from; the build checks that they multiply out to model and sensor. */
  chain: ModelChainSchema.optional(),
  /** The loop structure the recipe describes. */
  structure: z.enum(STRUCTURES),
  /** How the controller was tuned. */
  tuningRule: TuningRuleRefSchema,
  /** The inner loop, for a cascade. */
  innerLoop: InnerLoopSchema.optional(),
  /** Who answers for the recipe. */
  owner: OwnerSchema,
  /** Last time a senior engineer checked the recipe against the plant, YYYY-MM-DD. */
  reviewed: IsoDateSchema,
  /** Grows by one with every change to the file (the API's `revision`). */
  revision: z.number().int().min(1).default(1),
  /** Where the recipe is in the editorial flow. */
  status: z.enum(RECIPE_STATUSES),
  /** Why it was retired (required when retired). */
  retiredReason: z.string().min(3).optional(),
  /** Slug of the recipe that replaces it. */
  supersededBy: slug.optional(),
  /** Whether following the recipe changes a running loop (shows the standard cautions). */
  changesRunningLoop: z.boolean().default(true),
  /** Commissioning steps in order; the page and the printed sheet list them as a checklist. */
  commissioning: z.array(z.string().min(3)).default([]),
  /** Cautions particular to this loop, shown with the standard ones. */
  cautions: z.array(z.string().min(3)).default([]),
}).superRefine((r, ctx) => {
  if (r.status === 'retired' && !r.retiredReason) {
    ctx.addIssue({ code: 'custom', path: ['retiredReason'], message: 'A retired recipe needs retiredReason.' });
  }
  if (r.status !== 'retired' && (r.retiredReason || r.supersededBy)) {
    ctx.addIssue({ code: 'custom', path: ['status'], message: 'Only a retired recipe has retiredReason or supersededBy.' });
  }
  if (r.structure === 'cascade' && !r.innerLoop) {
    ctx.addIssue({ code: 'custom', path: ['innerLoop'], message: 'A cascade recipe describes its inner loop in innerLoop.' });
  }
});

export type RecipeFrontmatter = z.output<typeof RecipeFrontmatterSchema>;
export type RecipeFrontmatterInput = z.input<typeof RecipeFrontmatterSchema>;
