import { describe, expect, it } from 'vitest';
import { createRecord } from '../../src/record/record.js';

describe('createRecord', () => {
  it('takes the PGA as the largest |sample|', () => {
    // The samples are written out; the peak is the one of largest magnitude, −37.25.
    const record = createRecord({ name: 'x', dtS: 0.01, accelMS2: Float64Array.from([0.5, -37.25, 12, 37]) });
    expect(record.pgaMS2).toBe(37.25);
  });

  it('refuses a sample that is not finite with its 1-based number, the first such', () => {
    for (const [bad, word] of [
      [Number.NaN, 'NaN'],
      [Number.POSITIVE_INFINITY, 'Infinity'],
      [Number.NEGATIVE_INFINITY, '-Infinity'],
    ] as const) {
      const a = new Float64Array(50_000).fill(1);
      a[49_997] = bad;
      a[49_999] = Number.NaN; // a later one is not the first
      expect(() => createRecord({ name: 'x', dtS: 0.01, accelMS2: a })).toThrow(
        `sample 49998 is not a finite number (${word})`,
      );
    }
  });

  it('refuses a step that is not positive and fewer than 2 samples', () => {
    const two = Float64Array.from([0, 1]);
    expect(() => createRecord({ name: 'x', dtS: 0, accelMS2: two })).toThrow(/time step must be a positive/);
    expect(() => createRecord({ name: 'x', dtS: 0.01, accelMS2: two.subarray(1) })).toThrow(
      /at least 2 samples/,
    );
  });
});

describe('createRecord names', () => {
  it('strips terminal control sequences and what XML forbids from the name and the source', () => {
    // Invented name and path.
    const record = createRecord({
      name: 'site\u001b[2J\u0001h1',
      source: 'in\u0007/x.csv',
      dtS: 0.01,
      accelMS2: Float64Array.from([0, 1]),
    });
    expect([record.name, record.source]).toEqual(['siteh1', 'in/x.csv']);
  });
});
