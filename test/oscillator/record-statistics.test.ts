import { describe, expect, it } from 'vitest';
import { recordRoughness, recordStatistics } from '../../src/oscillator/record-statistics.js';

describe('recordStatistics', () => {
  // Closed forms: Δa_n of a sampled sine is 2 sin(Ωdt/2)·cos(Ω(n + ½)dt), so over whole cycles
  // RMS(Δa)/RMS(a) = 2 sin(Ωdt/2); a constant has R = 0. PGA and the peak jerk max|Δa|/dt by hand.
  it('gives R = 2 sin(Ωdt/2) for a sine, 0 for a constant, and the peak and jerk by hand', () => {
    const dtS = 0.01;
    const omega = 2 * Math.PI * 5; // 20 samples a cycle, 50 whole cycles
    const sine = Float64Array.from({ length: 1001 }, (_, i) => Math.sin(omega * i * dtS));
    expect(recordStatistics(sine, dtS).roughness).toBeCloseTo(2 * Math.sin((omega * dtS) / 2), 3);
    expect(recordRoughness(new Float64Array(50).fill(0.3))).toBe(0);
    expect(recordStatistics(Float64Array.from([0, 1, -2, 0.5]), 0.1).bounds).toEqual({
      pgaMS2: 2,
      jerkMS3: 30,
    });
  });
});
