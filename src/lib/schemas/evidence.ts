import { z } from 'zod';
import { TuningSettingSchema } from './tuning-setting';

/** The tuning chosen from a fitted model: the rule that gave it and the settings, with form and units. */
export const EvidenceTuningSchema = z.object({
  /** Tuning rule id (simc, lambda, imc, …) or "field" when set by hand; null when not said. */
  rule: z.string().trim().min(1).max(40).nullable().default(null),
  /** The publication the rule comes from, as the tuning API names it. */
  source: z.string().trim().max(300).nullable().default(null),
  /** The settings as entered in the controller. */
  setting: TuningSettingSchema,
});
export type EvidenceTuning = z.infer<typeof EvidenceTuningSchema>;

/** The start of a new draft recipe made from a step test. */
export const EvidenceDraftSchema = z.object({
  /** Headline of the new recipe. */
  title: z.string().trim().min(3, 'The title needs at least 3 characters.').max(120),
  /** One or two sentences on which loops it serves. */
  summary: z.string().trim().min(10, 'The summary needs at least 10 characters.').max(400),
  /** What the loop controls (flow, level, temperature, …). */
  loopType: z.string().trim().min(1),
});

/** POST /api/v1/evidence: a step test, its chosen fit and tuning, for an existing recipe or a new draft. */
export const EvidenceRequestSchema = z
  .object({
    /** The uploaded step test. */
    stepTestId: z.number().int().positive(),
    /** The fit chosen from it (must belong to the test). */
    fitId: z.number().int().positive(),
    tuning: EvidenceTuningSchema,
    /** What the engineer wants the next reader to know. */
    note: z.string().trim().max(2000).default(''),
    /** An existing recipe to attach the evidence to … */
    recipeSlug: z.string().trim().min(1).max(120).optional(),
    /** … or a new draft recipe to start with it. */
    newDraft: EvidenceDraftSchema.optional(),
    /** Registered loops this evidence also backs (by tag). */
    loopTags: z.array(z.string().trim().toUpperCase()).max(20).default([]),
  })
  .refine((r) => (r.recipeSlug === undefined) !== (r.newDraft === undefined), {
    message: 'Give either recipeSlug (an existing recipe) or newDraft (a new draft recipe), not both.',
    path: ['recipeSlug'],
  });
export type EvidenceRequest = z.infer<typeof EvidenceRequestSchema>;
