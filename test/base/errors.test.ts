import { describe, expect, it } from 'vitest';
import { inputError, isQuakesweepError, QuakesweepError, usageError } from '../../src/base/errors.js';

describe('QuakesweepError', () => {
  it('describes itself as file:line: message, file: message, or the message alone', () => {
    expect(inputError("'abc' is not a number", { file: 'rec.csv', line: 17 }).describe()).toBe(
      "rec.csv:17: 'abc' is not a number",
    );
    expect(inputError('no values', { file: 'empty.txt' }).describe()).toBe('empty.txt: no values');
    expect(inputError('no values').describe()).toBe('no values');
    // A line without a file says nothing useful, so only the message is written.
    expect(inputError('no values', { line: 3 }).describe()).toBe('no values');
  });

  it('keeps its kind and place; usage errors carry no place', () => {
    const input = inputError('bad', { file: 'a', line: 1 });
    expect([input.kind, input.file, input.line, input.message]).toEqual(['input', 'a', 1, 'bad']);
    const usage = usageError('--ground is required');
    expect([usage.kind, usage.file, usage.line]).toEqual(['usage', undefined, undefined]);
    expect(new QuakesweepError('internal', 'oops').kind).toBe('internal');
  });

  it('is told apart from other errors', () => {
    expect(isQuakesweepError(usageError('x'))).toBe(true);
    expect(isQuakesweepError(new Error('x'))).toBe(false);
    expect(isQuakesweepError({ kind: 'input', message: 'x' })).toBe(false);
    expect(usageError('x')).toBeInstanceOf(Error);
  });
});
