import { compileBodyIsolated } from '../recipes/authored-mdx/compile-isolated';
import { describeProblem } from '../recipes/authored-mdx/problem';
import { EditorialError } from './errors';

/** Compiles a body for saving; a refused body answers 400 invalid_body naming the line. */
export async function compileForSave(body: string): Promise<string> {
  const result = await compileBodyIsolated(body);
  if (!result.ok) {
    const first = result.problems[0];
    const more = result.problems.length > 1 ? ` (${result.problems.length - 1} more problem${result.problems.length > 2 ? 's' : ''} after it)` : '';
    throw new EditorialError(400, 'invalid_body', `${describeProblem(first)}${more}`, 'body', { problems: result.problems });
  }
  return result.html;
}
