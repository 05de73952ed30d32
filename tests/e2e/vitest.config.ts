import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['tests/e2e/**/*.e2e.spec.ts'],
    globalSetup: ['tests/e2e/global-setup.ts'],
    environment: 'node',
    testTimeout: 60_000,
    hookTimeout: 600_000,
    fileParallelism: false,
  },
});
