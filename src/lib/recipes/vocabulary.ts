import { BRINDLEWOOD_AREAS } from '../db/seeds/01-plant-areas';

/** What a loop controls; the browse page filters on it. */
export const LOOP_TYPES = ['flow', 'level', 'temperature', 'pressure', 'speed', 'position', 'ph', 'composition', 'other'] as const;
export type LoopType = (typeof LOOP_TYPES)[number];

/** How people read each loop type on a page. */
export const LOOP_TYPE_LABELS: Record<LoopType, string> = {
  flow: 'Flow',
  level: 'Level',
  temperature: 'Temperature',
  pressure: 'Pressure',
  speed: 'Speed',
  position: 'Position',
  ph: 'pH',
  composition: 'Composition',
  other: 'Other',
};

/** A recipe's place in the editorial flow. */
export const RECIPE_STATUSES = ['draft', 'in_review', 'published', 'retired'] as const;
export type RecipeStatus = (typeof RECIPE_STATUSES)[number];

export const STATUS_LABELS: Record<RecipeStatus, string> = {
  draft: 'Draft',
  in_review: 'In review',
  published: 'Published',
  retired: 'Retired',
};

/** Loop structures a recipe may describe. */
export const STRUCTURES = ['P', 'PI', 'PID', 'cascade', 'feedforward', 'ratio'] as const;
export type Structure = (typeof STRUCTURES)[number];

/** Process-area codes of the plant (the seeded plant_areas table uses the same codes). */
export const AREA_CODES = BRINDLEWOOD_AREAS.map((a) => a.code) as [string, ...string[]];

/** Area code → its name, for labels. */
export const AREA_NAMES: Record<string, string> = Object.fromEntries(BRINDLEWOOD_AREAS.map((a) => [a.code, a.name]));

/** Tuning rules a recipe may name: the engine's published rules, or tuned by hand in the field. */
export const TUNING_RULE_IDS = ['simc', 'lambda', 'imc', 'zn-open-loop', 'zn-ultimate', 'cohen-coon', 'amigo', 'field'] as const;
