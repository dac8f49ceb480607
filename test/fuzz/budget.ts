// Moved to test/helpers/fuzz-budget.ts; kept while test/record still imports this path.
export * from '../helpers/fuzz-budget.js';
