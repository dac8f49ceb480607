import { availableParallelism } from 'node:os';
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
    // One test file per core. Vitest's default, one fewer than the cores, runs the files one at a
    // time on a 2-core machine; the main process mostly waits while they run.
    maxWorkers: availableParallelism(),
    // Test files share their worker's loaded modules (jsdom, d3, the sources) instead of loading
    // them again for each file. Tests that change process state (the working folder, environment
    // variables, process.stdout.write) restore it before they end.
    isolate: false,
  },
});
