import { defineConfig } from 'vitest/config'

// Three projects. `unit` is pure and needs nothing running. `api` and `e2e` talk to the built
// server that scripts/test.mjs starts against its own throwaway PostgreSQL, object store and
// SMTP fake, and hands over in IONFOLIO_TEST_* environment variables.
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          include: ['tests/unit/**/*.test.ts'],
          environment: 'node',
          // The whole-table sweeps (every species, every method) take a few seconds on a quiet
          // machine; CI's machine is shared, so give them room rather than flaky timeouts.
          testTimeout: 30_000,
        },
      },
      {
        test: {
          name: 'api',
          include: ['tests/api/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 90_000,
        },
      },
    ],
  },
})
