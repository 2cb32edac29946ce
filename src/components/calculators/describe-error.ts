/** The message of an engine or validation error, as one sentence to show under a calculator. */
export function describeError(error: unknown): string {
  if (error instanceof Error && error.message) return error.message;
  return 'These numbers cannot be computed; check the fields above.';
}
