/** Upload limits for a step-test file. */
export const STEP_TEST_LIMITS = {
  /** Largest accepted file, bytes (5 MB, binary megabytes). */
  maxBytes: 5 * 1024 * 1024,
  /** Most data rows (header and blank lines not counted). */
  maxRows: 200_000,
  /** Fewest data rows a fit can work with (the identification route needs at least 10 samples). */
  minRows: 10,
  /** Issues listed in full; the total count is always reported. */
  maxListedIssues: 100,
} as const;
