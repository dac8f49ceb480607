import { describe, expect, it } from 'vitest';
import { assertFiniteResult } from '../../src/formats/finite.js';
import { frequenciesHz, frequencyHz } from '../../src/formats/frequency.js';

describe('frequenciesHz', () => {
  it('is f = 1/T of each period, null at T = 0 (f = ∞, which JSON cannot hold)', () => {
    // By hand: 1/0.02 = 50, 1/0.5 = 2, 1/4 = 0.25 Hz.
    expect(frequenciesHz(Float64Array.of(0, 0.02, 0.5, 4))).toEqual([null, 50, 2, 0.25]);
    expect(frequencyHz(0)).toBeNull();
    expect(frequencyHz(0.1)).toBeCloseTo(10, 12);
  });

  it('passes the finite check every JSON output goes through (null is allowed there)', () => {
    expect(() => assertFiniteResult({ frequencies_hz: frequenciesHz([0, 1]) })).not.toThrow();
  });
});
