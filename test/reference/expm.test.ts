// Independent reference: mathjs's expm (Padé approximation with scaling and squaring; Higham
// 2005) for the augmented matrix whose exponential is the piecewise-exact step.
import { expm as mathjsExpm, matrix } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { expm } from '../../src/oscillator/expm.js';
import { piecewiseExactCoefficients } from '../../src/oscillator/recurrence.js';

describe('matrix exponential', () => {
  it.each([
    [2 * Math.PI, 0.05, 0.01],
    [2 * Math.PI * 50, 0, 0.02],
    [0.3, 0.5, 0.005],
    [10, 1, 0.1],
    [10, 3, 0.05],
  ])('of the augmented oscillator matrix agrees with mathjs (ω = %s, ζ = %s, h = %s)', (omega, zeta, h) => {
    const k = omega * omega;
    const c = 2 * zeta * omega;
    const rows = [
      [0, h, 0, 0],
      [-k * h, -c * h, -h, 0],
      [0, 0, 0, 1],
      [0, 0, 0, 0],
    ];
    const reference = (mathjsExpm(matrix(rows)).toArray() as number[][]).flat();
    const ours = expm(Float64Array.from(rows.flat()), 4);
    const scale = Math.max(...reference.map(Math.abs));
    for (const [i, value] of reference.entries())
      expect(Math.abs(ours[i] - value) / scale).toBeLessThan(1e-12);
    const step = piecewiseExactCoefficients(omega, zeta, h);
    expect(step.uu).toBeCloseTo(reference[0], 12);
    expect(step.up1).toBeCloseTo(reference[3], 12);
    expect(step.vp0).toBeCloseTo(reference[6] - reference[7], 12);
  });
});
