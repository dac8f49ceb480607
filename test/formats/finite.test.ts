import { describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import { assertFiniteResult } from '../../src/formats/finite.js';

/** The message assertFiniteResult throws, or undefined when it accepts the value. */
function refusal(value: unknown): string | undefined {
  try {
    assertFiniteResult(value);
    return undefined;
  } catch (error) {
    expect(isQuakesweepError(error) && error.kind).toBe('input');
    return (error as Error).message;
  }
}

describe('assertFiniteResult', () => {
  it('accepts finite numbers, null (used on purpose for "not defined here"), text and booleans', () => {
    expect(refusal({ a: [1, -0, 1e308, null], b: 'NaN', c: true, d: Float64Array.of(1, 2) })).toBeUndefined();
  });

  it('refuses NaN and ±Infinity, naming the path to the first one', () => {
    expect(refusal({ spectra: [{ psa_g: [0.1, Number.NaN] }] })).toBe(
      'a result is not a finite number (spectra[0].psa_g[1] = NaN); the record or the options are out of range, so nothing was written',
    );
    expect(refusal({ record: { pga_g: Number.POSITIVE_INFINITY } })).toMatch(/\(record\.pga_g = Infinity\)/);
    expect(refusal([[1], [2, Number.NEGATIVE_INFINITY]])).toMatch(/\(\[1\]\[1\] = -Infinity\)/);
  });

  it('looks inside typed arrays, and refuses a bare value too', () => {
    expect(refusal({ sd: Float64Array.of(0, 1, Number.NaN) })).toMatch(/\(sd\[2\] = NaN\)/);
    expect(refusal(Number.NaN)).toMatch(/= NaN\)/);
  });
});
