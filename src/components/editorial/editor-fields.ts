import type { EditorFields } from './RecipeEditor';

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
    body: r.body,
  };
}
