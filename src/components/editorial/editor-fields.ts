import type { EditorFields } from './RecipeEditor';
import { claimRows, sensorRow, tuningRow } from './loop-fields';

/** A recipe as the API answers it, as much of it as the editor's form holds. */
export interface RecipeForForm {
  title: string;
  summary: string;
  loopType: string;
  body: string;
  area?: string | null;
  loopTags?: string[];
  units?: { pv: string; mv: string } | null;
  tags?: string[];
  cautions?: string[];
  model?: unknown;
  controller?: unknown;
  claims?: unknown;
  sensor?: unknown;
  tuningRule?: unknown;
  modelSource?: string | null;
}

/** The editor's form fields from a recipe (lists become comma- or line-separated text). */
export function fieldsFromRecipe(r: RecipeForForm): EditorFields {
  return {
    title: r.title,
    summary: r.summary,
    loopType: r.loopType,
    area: r.area ?? '',
    loopTags: (r.loopTags ?? []).join(', '),
    pvUnit: r.units?.pv ?? '',
    mvUnit: r.units?.mv ?? '',
    tags: (r.tags ?? []).join(', '),
    cautions: (r.cautions ?? []).join('\n'),
    model: (r.model as EditorFields['model']) ?? null,
    controller: (r.controller as EditorFields['controller']) ?? null,
    claims: claimRows(r.claims),
    sensor: sensorRow(r.sensor),
    tuningRule: tuningRow(r.tuningRule),
    modelSource: r.modelSource ?? '',
    body: r.body,
  };
}

/** The new-field defaults, for a form started from a template or restored from an older backup. */
export const EMPTY_LOOP_FIELDS = { claims: [], sensor: null, tuningRule: { rule: '', designTime: '', note: '' }, modelSource: '' } satisfies Pick<EditorFields, 'claims' | 'sensor' | 'tuningRule' | 'modelSource'>;
