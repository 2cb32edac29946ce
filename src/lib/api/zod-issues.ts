import type { z } from 'zod';
import { ApiError } from './errors';
import { describeValue, valueAt } from './describe-value';

type Issue = z.core.$ZodIssue;
type Path = readonly PropertyKey[];

/** Chooses the contract code for an issue at a path (e.g. `invalid_model` under `plant`). */
export type CodeForPath = (path: readonly (string | number)[], issue: Issue, received: unknown) => string;

/** The dotted field path of the contract: `plant.1.den.0`. */
export function dottedPath(path: Path): string | undefined {
  return path.length === 0 ? undefined : path.map(String).join('.');
}

/**
 * Turns the first zod issue into a 400 ApiError with the contract's code, a plain sentence and
 * the dotted field. `input` is the parsed body, used to say what was received. A refinement may
 * name its code in `params.code`; otherwise `codeFor` decides.
 */
export function issueToApiError(error: z.ZodError, input: unknown, codeFor: CodeForPath): ApiError {
  // An unknown key is most often a typo of a required one; naming it helps more than "missing".
  const first = error.issues.find((i) => i.code === 'unrecognized_keys') ?? error.issues[0]!;
  const { issue, path } = innermost(first, []);
  const keys = path.map((k) => (typeof k === 'number' ? k : String(k)));
  const target = issue.code === 'unrecognized_keys' ? [...keys, issue.keys[0]!] : keys;
  const field = dottedPath(target);
  const received = valueAt(input, keys);
  const named = issue.code === 'custom' ? issue.params?.code : undefined;
  const code = typeof named === 'string' ? named : codeFor(target, issue, received);
  return new ApiError(400, code, sentence(issue, field, received), field);
}

/**
 * In a union, the branch whose first issue got deepest into the value is the one the caller
 * meant (an object given for `plant` fails the array branch at its root).
 */
function innermost(issue: Issue, parent: Path): { issue: Issue; path: Path } {
  const path = [...parent, ...issue.path];
  if (issue.code !== 'invalid_union' || issue.errors.length === 0) return { issue, path };
  const candidates = issue.errors
    .filter((branch) => branch.length > 0)
    .map((branch) => innermost(branch[0]!, path));
  candidates.sort((a, b) => b.path.length - a.path.length);
  return candidates[0] ?? { issue, path };
}

function sentence(issue: Issue, field: string | undefined, received: unknown): string {
  const subject = field ?? 'The request body';
  switch (issue.code) {
    case 'invalid_type':
      return invalidType(subject, issue.expected, received);
    case 'too_small':
      return tooSmall(subject, issue.origin, Number(issue.minimum), issue.inclusive ?? true);
    case 'too_big':
      return tooBig(subject, issue.origin, Number(issue.maximum), issue.inclusive ?? true);
    case 'invalid_value':
      return `${subject} must be ${oneOf(issue.values)}, not ${describeValue(received)}.`;
    case 'unrecognized_keys':
      return `Remove the unknown key "${issue.keys[0]}"${field && field.includes('.') ? ` (at ${field})` : ''}; check its spelling against the API contract.`;
    case 'invalid_union':
      if (issue.discriminator !== undefined && 'options' in issue && issue.options) {
        if (received === undefined) return `Give ${subject} (${oneOf(issue.options)}); it is missing.`;
        return `${subject} must be ${oneOf(issue.options)}, not ${describeValue(received)}.`;
      }
      return `${subject} has the wrong shape; check it against the API contract.`;
    case 'not_multiple_of':
      return `${subject} must be a multiple of ${issue.divisor}.`;
    default:
      return ensureSentence(issue.message, subject);
  }
}

function invalidType(subject: string, expected: string, received: unknown): string {
  if (received === undefined) return `Give ${subject} (${article(expected)}); it is missing.`;
  if (expected === 'number' && typeof received === 'string' && /^[+-]?(nan|inf)/i.test(received.trim())) {
    return `${subject} must be a finite number, not the text "${received}"; JSON has no NaN or Infinity.`;
  }
  if (expected === 'number' && typeof received === 'number') {
    return `${subject} must be a finite number, not ${String(received)}.`;
  }
  if (expected === 'int') return `${subject} must be a whole number, not ${describeValue(received)}.`;
  return `${subject} must be ${article(expected)}, not ${describeValue(received)}.`;
}

function tooSmall(subject: string, origin: string, min: number, inclusive: boolean): string {
  if (origin === 'array' || origin === 'set') {
    return min <= 1 ? `${subject} must not be empty.` : `${subject} needs at least ${min} entries.`;
  }
  if (origin === 'string') return `${subject} must not be empty.`;
  if (min === 0) return `${subject} must be ${inclusive ? 'zero or more' : 'greater than 0'}.`;
  return `${subject} must be ${inclusive ? 'at least' : 'greater than'} ${min}.`;
}

function tooBig(subject: string, origin: string, max: number, inclusive: boolean): string {
  if (origin === 'array' || origin === 'set') return `${subject} may have at most ${max} entries.`;
  if (origin === 'string') return `${subject} may be at most ${max} characters long.`;
  return `${subject} must be ${inclusive ? 'at most' : 'less than'} ${max}.`;
}

function oneOf(values: readonly unknown[]): string {
  const shown = values.map((v) => JSON.stringify(v));
  return shown.length === 1 ? shown[0]! : `one of ${shown.join(', ')}`;
}

function article(expected: string): string {
  const names: Record<string, string> = {
    number: 'a number',
    int: 'a whole number',
    string: 'a text',
    boolean: 'true or false',
    array: 'a list',
    object: 'an object',
  };
  return names[expected] ?? expected;
}

/** Refinement messages are written as sentences; make sure they name the field. */
function ensureSentence(message: string, subject: string): string {
  const text = message.trim().replace(/\.?$/, '.');
  if (text.includes(subject) || subject === 'The request body') return text;
  return `Check ${subject}: ${text.charAt(0).toLowerCase()}${text.slice(1)}`;
}
