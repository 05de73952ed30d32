import { defineConfig } from 'vitest/config';

// Server-side, shared and reference suites. Angular components run through `ng test`,
// browser tests through tests/e2e/vitest.config.ts.
export default defineConfig({
  test: {
    include: [
      'services/**/*.spec.ts',
      'gateway/**/*.spec.ts',
      'shared/**/*.spec.ts',
      'tests/reference/**/*.spec.ts',
      'tests/api/**/*.spec.ts',
      'tests/durability/**/*.spec.ts', 'tests/security/**/*.spec.ts',
    ],
    environment: 'node',
    pool: 'forks',
    testTimeout: 20000,
  },
});
