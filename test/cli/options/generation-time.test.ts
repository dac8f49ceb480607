import { afterEach, describe, expect, it } from 'vitest';
import { generationTime } from '../../../src/cli/options/generation-time.js';

const saved = process.env.SOURCE_DATE_EPOCH;
afterEach(() => {
  if (saved === undefined) delete process.env.SOURCE_DATE_EPOCH;
  else process.env.SOURCE_DATE_EPOCH = saved;
});

describe('generationTime', () => {
  it('is the time SOURCE_DATE_EPOCH names, in seconds since 1970 (reproducible-builds.org)', () => {
    process.env.SOURCE_DATE_EPOCH = '86400';
    expect(generationTime()).toBe('1970-01-02T00:00:00.000Z');
  });

  it('is now when the variable is missing or not a whole number of seconds', () => {
    for (const value of [undefined, '1.5', 'yesterday']) {
      if (value === undefined) delete process.env.SOURCE_DATE_EPOCH;
      else process.env.SOURCE_DATE_EPOCH = value;
      const before = Date.now();
      const time = Date.parse(generationTime());
      expect(time).toBeGreaterThanOrEqual(before - 1);
      expect(time).toBeLessThanOrEqual(Date.now() + 1);
    }
  });
});
