import { db } from '../db';
import { productionProblems } from './production';

let verdict: Promise<string[]> | undefined;

/**
 * In production, the reasons this server must not serve (checked once, at the first request,
 * after migrations); an empty list elsewhere or when all is well.
 */
export function productionBlockers(): Promise<string[]> {
  verdict ??= productionProblems(db()).then((problems) => {
    if (problems.length) console.error(`Loopwright refuses to serve in production:\n- ${problems.join('\n- ')}`);
    return problems;
  });
  return verdict;
}
