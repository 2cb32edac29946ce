import { z } from 'zod';

/** Why an authored body was refused, and where: 1-based line and column of the offending text. */
export const BodyProblemSchema = z.object({
  /** 1-based line in the body. */
  line: z.number().int().min(1),
  /** 1-based column in that line. */
  column: z.number().int().min(1),
  /** One plain sentence the author can act on. */
  reason: z.string(),
});

export type BodyProblem = z.infer<typeof BodyProblemSchema>;

/** A point in the body, as parsers report it. */
export interface SourcePoint {
  line?: number | null;
  column?: number | null;
}

/** Builds a problem at a point (unknown positions become line 1, column 1). */
export function problemAt(point: SourcePoint | null | undefined, reason: string): BodyProblem {
  return { line: Math.max(1, point?.line ?? 1), column: Math.max(1, point?.column ?? 1), reason };
}

/** "Line 3, column 5: reason" — the form the API's `invalid_body` message uses. */
export function describeProblem(problem: BodyProblem): string {
  return `Line ${problem.line}, column ${problem.column}: ${problem.reason}`;
}
