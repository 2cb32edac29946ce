import type { CsvIssue } from './csv';

/**
 * A request the field-data services refuse, with what the API answers: status, the contract's
 * error code, one sentence, the field it concerns and, for files, every issue by line.
 */
export class FieldDataProblem extends Error {
  constructor(
    readonly status: 400 | 404 | 409 | 413,
    readonly code: string,
    message: string,
    readonly field?: string,
    readonly issues?: { list: CsvIssue[]; count: number },
  ) {
    super(message);
    this.name = 'FieldDataProblem';
  }
}

export const invalid = (message: string, field?: string) => new FieldDataProblem(400, 'invalid_request', message, field);
export const missing = (message: string) => new FieldDataProblem(404, 'not_found', message);

/** 400 `invalid_file`: the message is the first issue, all issues travel with it. */
export function invalidFile(issues: CsvIssue[], count: number, field = 'file'): FieldDataProblem {
  const first = issues[0]?.message ?? 'The file could not be read.';
  const more = count > 1 ? ` (${count - 1} more ${count === 2 ? 'problem' : 'problems'} listed in issues)` : '';
  return new FieldDataProblem(400, 'invalid_file', `${first.replace(/\.$/, '')}${more}.`, field, { list: issues, count });
}

/** The first zod issue as a problem naming its dotted field. */
export function fromZod(error: { issues: { path: PropertyKey[]; message: string }[] }, prefix = ''): FieldDataProblem {
  const issue = error.issues[0];
  const path = [prefix, ...(issue?.path ?? []).map(String)].filter(Boolean).join('.');
  const detail = (issue?.message ?? 'invalid input').replace(/\.$/, '');
  return invalid(path ? `Check ${path}: ${detail}.` : `${detail}.`, path || undefined);
}
