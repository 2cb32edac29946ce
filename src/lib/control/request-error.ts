import type { z } from 'zod';
import { ModelError } from './types';

type Code = ModelError['code'];
/** Chooses the error code from the dotted field path (e.g. model fields answer invalid_model). */
type CodeFor = (field: string) => Code;

/**
 * Turns the first zod issue into a ModelError whose field is the dotted path into the request
 * (array indexes as numbers, e.g. `model.tau`, `y.3`), so every boundary answers the same way.
 */
export function requestError(error: z.ZodError, codeFor: CodeFor = () => 'invalid_request'): ModelError {
  const issue = error.issues[0];
  const field = issue?.path.map(String).join('.') || undefined;
  const detail = (issue?.message ?? 'invalid input').replace(/\.$/, '');
  const message = field ? `Check ${field}: ${detail}.` : `Invalid request: ${detail}.`;
  return new ModelError(message, codeFor(field ?? ''), field);
}

/** Parses with a schema and throws requestError on failure. */
export function parseRequest<T extends z.ZodType>(schema: T, input: unknown, codeFor?: CodeFor): z.infer<T> {
  const result = schema.safeParse(input);
  if (!result.success) throw requestError(result.error, codeFor);
  return result.data;
}
