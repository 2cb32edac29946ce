/** Tuning (POST /api/v1/calc/tune): request validation on top of the rules in rules.ts. */
import { parseRequest } from '../request-error';
import { designController } from './rules';
import { TuneRequestSchema, type TuneRequest, type TuneResult } from './schema';

export * from './rules';
export * from './schema';

/**
 * Tunes a PI or PID controller by a published rule. Validates the request with zod and answers
 * ModelError('invalid_request') for any combination the contract's applicability table does not
 * list (field `rule`, `model.type` or `controller`).
 */
export function tune(input: TuneRequest | unknown): TuneResult {
  const request = parseRequest(TuneRequestSchema, input);
  return designController(request.model, request.rule, request.controller, request.options ?? {});
}
