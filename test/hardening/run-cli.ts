// Moved to test/helpers/run-cli.ts; kept while test/golden and test/plot still import this path.
export * from '../helpers/run-cli.js';
