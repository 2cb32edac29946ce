import { z } from 'zod';
import { TuningSettingSchema } from './tuning-setting';

/** ISA-5.1 style loop tag: 2–5 letters, a hyphen, 2–5 digits, an optional suffix letter (TIC-210, FIC-101A). */
export const LoopTagSchema = z
  .string()
  .trim()
  .toUpperCase()
  .regex(/^[A-Z]{2,5}-\d{2,5}[A-Z]?$/, 'A loop tag is 2–5 letters, a hyphen and 2–5 digits, e.g. TIC-210 or FIC-101A.');

/** A calendar date, YYYY-MM-DD. */
export const IsoDateSchema = z.iso.date('Use a date written YYYY-MM-DD.');

/** A registered control loop as it is created or replaced. */
export const LoopInputSchema = z.object({
  /** ISA-5.1 tag, unique in the register. */
  tag: LoopTagSchema,
  /** Plant area code (plant_areas.code), e.g. "htst". */
  area: z.string().trim().min(1, 'Choose the plant area.'),
  /** What the loop does, in a sentence. */
  description: z.string().trim().max(500, 'The description is at most 500 characters.').default(''),
  /** Slug of the recipe the loop follows; null when it follows none. */
  recipeSlug: z.string().trim().min(1).max(120).nullable().default(null),
  /** Tuning as left after commissioning, with form and units; null when not recorded. */
  tuning: TuningSettingSchema.nullable().default(null),
  /** Who commissioned it (name as the team writes it). */
  commissionedBy: z.string().trim().max(100).nullable().default(null),
  /** When the tuning was left in the controller. */
  commissionedAt: IsoDateSchema.nullable().default(null),
  /** Who answers for the loop; told when the recipe it follows is retired. */
  ownerEmail: z.email('The owner must be an e-mail address.'),
});

export type LoopInput = z.infer<typeof LoopInputSchema>;

/** A loop as stored and returned. */
export type Loop = LoopInput & {
  id: number;
  /** Evidence ids linked to the loop. */
  evidenceIds: number[];
  createdAt: string;
  updatedAt: string;
};
