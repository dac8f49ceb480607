import { describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import { checkTimeScale, PLAUSIBLE, plausibilityWarnings } from '../../src/record/plausibility.js';
import { createRecord } from '../../src/record/record.js';

// Invented records; the bands are common practice (plausibility.ts), the peaks closed forms.

const G = 9.80665;

/** A constant acceleration `aMS2` for `n` samples at `dtS`: v = a t, d = a t²/2 (exact by the trapezoid). */
function constant(aMS2: number, n: number, dtS: number) {
  return createRecord({ name: 'c', dtS, accelMS2: new Float64Array(n).fill(aMS2), unitsRead: 'm/s2' });
}

describe('plausibility bands (common practice)', () => {
  it('says nothing for an ordinary record', () => {
    // 0.1 g for 1 s: PGV 0.98 m/s, PGD 0.49 m.
    expect(plausibilityWarnings(constant(0.1 * G, 101, 0.01))).toEqual([]);
  });

  it('warns on PGV above 5 m/s and PGD above 10 m', () => {
    // 1 m/s² for 6 s: PGV 6 m/s, PGD 18 m.
    const w = plausibilityWarnings(constant(1, 601, 0.01));
    expect(w).toHaveLength(2);
    expect(w[0]).toMatch(/^PGV 6\.00 m\/s is above 5 m\/s/);
    expect(w[1]).toMatch(/^PGD 18\.0 m is above 10 m/);
  });

  it('warns on a duration above 2 h', () => {
    const long = createRecord({ name: 'l', dtS: 1, accelMS2: new Float64Array(7202), unitsRead: 'g' });
    expect(plausibilityWarnings(long).at(-1)).toMatch(/lasts 2\.00 h, above 2 h/);
    expect(PLAUSIBLE.durationMaxS).toBe(7200);
  });
});

describe('time scale', () => {
  const refused = (run: () => void) => {
    try {
      run();
    } catch (error) {
      if (isQuakesweepError(error)) return error.kind;
      throw error;
    }
    return 'read';
  };

  it('refuses a step of 1 s or more, or a record over a day, unless told', () => {
    expect(refused(() => checkTimeScale(0.01, 4001, 'x', 'f', false))).toBe('read');
    expect(refused(() => checkTimeScale(10, 4001, 'x', 'f', false))).toBe('input');
    expect(refused(() => checkTimeScale(0.5, 200_000, 'x', 'f', false))).toBe('input'); // 27.8 h
    expect(refused(() => checkTimeScale(10, 4001, 'x', 'f', true))).toBe('read');
  });
});
