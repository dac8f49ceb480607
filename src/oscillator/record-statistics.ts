/** Bounds on the ground motion that the refinement thresholds use (see refinementThresholds in peak.ts). */
export interface GroundBounds {
  /** Peak |ground acceleration|, m/s². */
  pgaMS2: number;
  /** Peak |ground jerk| of the linearly interpolated record, max |Δa|/dt, m/s³. */
  jerkMS3: number;
}

/** The record's roughness (recordRoughness) and bounds (GroundBounds), in one pass over it. */
export function recordStatistics(
  accelMS2: Float64Array,
  dtS: number,
): { roughness: number; bounds: GroundBounds } {
  let sum = accelMS2[0] * accelMS2[0];
  let sumDifferences = 0;
  let pgaMS2 = Math.abs(accelMS2[0]);
  let jump = 0;
  for (let i = 1; i < accelMS2.length; i++) {
    const a = accelMS2[i];
    const difference = a - accelMS2[i - 1];
    sum += a * a;
    sumDifferences += difference * difference;
    pgaMS2 = Math.max(pgaMS2, Math.abs(a));
    jump = Math.max(jump, Math.abs(difference));
  }
  const n = accelMS2.length;
  const roughness = sum === 0 ? 0 : Math.sqrt(sumDifferences / (n - 1) / (sum / n));
  return { roughness, bounds: { pgaMS2, jerkMS3: jump / dtS } };
}

/**
 * How much of the record's content sits near its Nyquist frequency, for recordSubsteps: R =
 * RMS(Δa)/RMS(a), which is 2 sin(Ωdt/2) for a sine of circular frequency Ω (2 at the Nyquist frequency).
 */
export function recordRoughness(accelMS2: Float64Array): number {
  return recordStatistics(accelMS2, 1).roughness;
}
