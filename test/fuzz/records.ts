// Moved to test/helpers/fuzz-records.ts; kept while test/record still imports this path.
export * from '../helpers/fuzz-records.js';
