import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    include: ['test/**/*.test.ts'],
    globalSetup: ['test/global-setup.ts'],
    // The JSON report lets .ci/run print its closing 'N passed, N failed' line.
    reporters: ['default', ['json', { outputFile: 'test-results.json' }]],
    testTimeout: 60_000,
    hookTimeout: 60_000,
    pool: 'forks',
  },
});
