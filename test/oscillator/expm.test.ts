import { describe, expect, it } from 'vitest';
import { expm } from '../../src/oscillator/expm.js';

// Closed forms of the matrix exponential (any linear algebra text); the outside check against
// another implementation is test/reference/expm.test.ts.
describe('expm', () => {
  it('of 0 is I, and of a diagonal matrix the exponentials of its entries', () => {
    expect(Array.from(expm(new Float64Array(4), 2))).toEqual([1, 0, 0, 1]);
    const diagonal = expm(Float64Array.of(1, 0, 0, 0, -3, 0, 0, 0, 12), 3);
    expect(diagonal[0] / Math.E).toBeCloseTo(1, 13);
    expect(diagonal[4] / Math.exp(-3)).toBeCloseTo(1, 13);
    expect(diagonal[8] / Math.exp(12)).toBeCloseTo(1, 12); // norm 12: four squarings
    expect([diagonal[1], diagonal[2], diagonal[3], diagonal[5]]).toEqual([0, 0, 0, 0]);
  });

  it('of a rotation generator [[0, θ], [−θ, 0]] is the rotation by θ, for small and large θ', () => {
    for (const theta of [0.1, 2, 40]) {
      const [c, s, minusS, c2] = expm(Float64Array.of(0, theta, -theta, 0), 2);
      expect(c).toBeCloseTo(Math.cos(theta), 11);
      expect(s).toBeCloseTo(Math.sin(theta), 11);
      expect(minusS).toBeCloseTo(-Math.sin(theta), 11);
      expect(c2).toBeCloseTo(Math.cos(theta), 11);
    }
  });

  it('of a nilpotent matrix is the finite series I + N + N²/2', () => {
    // N = [[0, a, b], [0, 0, c], [0, 0, 0]]: exp N = [[1, a, b + ac/2], [0, 1, c], [0, 0, 1]].
    const [a, b, c] = [3, -2, 5];
    const result = expm(Float64Array.of(0, a, b, 0, 0, c, 0, 0, 0), 3);
    const expected = [1, a, b + (a * c) / 2, 0, 1, c, 0, 0, 1];
    for (let i = 0; i < 9; i++) expect(result[i]).toBeCloseTo(expected[i], 12);
  });

  it('leaves its argument as it was', () => {
    const matrix = Float64Array.of(0, 4, -4, -1);
    expm(matrix, 2);
    expect(Array.from(matrix)).toEqual([0, 4, -4, -1]);
  });
});
