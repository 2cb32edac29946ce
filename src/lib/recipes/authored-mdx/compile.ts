import { precheckBody } from './limits';
import { parseBody } from './parse';
import { renderTree } from './render';
import { validateTree, type PlacedIsland } from './validate';
import type { BodyProblem } from './problem';

/** The outcome of compiling an authored body: safe HTML with island placeholders, or why not. */
export type CompileResult =
  | { ok: true; html: string; islands: PlacedIsland[] }
  | { ok: false; problems: BodyProblem[] };

/**
 * Checks and renders an authored MDX body in this thread. Nothing in the body is evaluated.
 * Servers call `compileBodyIsolated` instead, which runs this in a worker with a hard timeout.
 */
export function compileBody(body: string): CompileResult {
  const early = precheckBody(body);
  if (early) return { ok: false, problems: [early] };
  const parsed = parseBody(body);
  if (!parsed.ok) return { ok: false, problems: [parsed.problem] };
  const { problems, islands } = validateTree(parsed.tree);
  if (problems.length > 0) return { ok: false, problems };
  return { ok: true, html: renderTree(parsed.tree, islands), islands };
}
