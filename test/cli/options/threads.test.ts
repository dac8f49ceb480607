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

describe('addThreadOptions', () => {
  it('adds --threads with one help everywhere, and --kernel unless told not to', async () => {
    const { Command } = await import('commander');
    const { addThreadOptions, THREADS_HELP } = await import('../../../src/cli/options/threads.js');
    const sweep = addThreadOptions(new Command('a'));
    expect(sweep.options.map((o) => o.long)).toEqual(['--threads', '--kernel']);
    expect(sweep.options[0].description).toBe(THREADS_HELP);
    expect(addThreadOptions(new Command('b'), false).options.map((o) => o.long)).toEqual(['--threads']);
  });
});
