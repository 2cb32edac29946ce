import type { AuthoredRecipeWithRevision } from '../db/authored-recipes';
import { RecipeFrontmatterSchema } from '../recipes/frontmatter';
import { EditorialError } from './errors';
import { authoredRecord } from './records';

/** What each required field is called in a sentence to the author. */
const FIELD_WORDS: Record<string, string> = {
  model: 'the process model',
  controller: 'the controller',
  area: 'the process area',
  loopTags: 'at least one loop tag',
  units: 'the measurement and output units',
  title: 'the title',
  summary: 'the summary',
};

/**
 * A draft may be incomplete; one that goes to review must have what every recipe page shows
 * (the file recipes' frontmatter schema, with the server-kept fields filled in). Null when ready.
 */
export function reviewReadiness(row: AuthoredRecipeWithRevision): EditorialError | null {
  const parsed = RecipeFrontmatterSchema.safeParse(authoredRecord(row).data);
  if (parsed.success) return null;
  const issue = parsed.error.issues[0];
  const field = issue.path.map(String).join('.');
  const words = FIELD_WORDS[String(issue.path[0])] ?? field;
  return new EditorialError(400, 'invalid_request', `Before it goes to review, fill in ${words} (${field}: ${issue.message.replace(/\.$/, '')}).`, field);
}
