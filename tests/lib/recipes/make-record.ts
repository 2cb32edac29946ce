import { RecipeFrontmatterSchema, type RecipeFrontmatterInput } from '../../../src/lib/recipes/frontmatter';
import { fileRecord, type RecipeRecord } from '../../../src/lib/recipes/record';

/** A valid frontmatter for tests: a PI flow loop (numbers as in the reception-flow recipe). */
export const BASE_FRONTMATTER: RecipeFrontmatterInput = {
  title: 'Test flow loop',
  summary: 'A flow loop used by the tests.',
  loopType: 'flow',
  area: 'silos',
  loopTags: ['FIC-900'],
  units: { pv: 'm³/h', mv: '% valve' },
  model: { type: 'fopdt', k: 0.45, tau: 2.5, theta: 0.6 },
  modelSource: 'Invented for the tests.',
  structure: 'PI',
  controller: { form: 'ideal', kc: 1.54, ti: 2.5 },
  tuningRule: { rule: 'lambda', designTime: 3 },
  owner: { name: 'Test Owner', email: 'owner@brindlewood.example' },
  reviewed: '2026-01-01',
  status: 'published',
};

/** A record through the real schema, so a test can never build a recipe the schema refuses. */
export function makeRecord(slug: string, overrides: Partial<RecipeFrontmatterInput> = {}, body = ''): RecipeRecord {
  return fileRecord(slug, RecipeFrontmatterSchema.parse({ ...BASE_FRONTMATTER, ...overrides }), body);
}
