import { defineConfig } from 'vitest/config';

/**
 * Three layers: `unit` (pure code and database modules on temporary files), `api` (the built
 * server over HTTP against a fresh temporary database), `browser` (headless Chromium against
 * the built server). `npm test` builds before running, so `api` and `browser` see current code.
 */
export default defineConfig({
  test: {
    // The JSON report lets .ci/run print a one-line tally of what ran.
    reporters: ['default', 'json'],
    outputFile: { json: 'test-artifacts/vitest-report.json' },
    projects: [
      { test: { name: 'unit', include: ['tests/lib/**/*.test.ts', 'tests/components/**/*.test.ts'], environment: 'node' } },
      { test: { name: 'api', include: ['tests/api/**/*.test.ts'], testTimeout: 30_000, hookTimeout: 60_000 } },
      {
        test: {
          name: 'browser',
          include: ['tests/browser/**/*.test.ts'],
          testTimeout: 60_000,
          hookTimeout: 60_000,
          // One Chromium at a time keeps a 2-core machine responsive.
          pool: 'forks',
          poolOptions: { forks: { singleFork: true } },
        },
      },
    ],
  },
});
