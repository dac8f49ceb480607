import { describe, expect, it } from 'vitest';
import { parseThreads } from '../../../src/cli/options/threads.js';

describe('parseThreads', () => {
  it('takes a whole number from 1 to 256', () => {
    expect(parseThreads('1')).toBe(1);
    expect(parseThreads('256')).toBe(256);
  });

  it.each(['0', '257', '1.5', 'two', '-1'])('refuses %s, quoting it', (text) => {
    expect(() => parseThreads(text)).toThrow(`--threads must be a whole number from 1 to 256, got '${text}'`);
  });
});
