/**
 * Ground velocity and displacement for the time-history figure. A stopgap inside the plot module:
 * the record module's own integrator should replace it once it exists.
 */
export interface GroundHistories {
  timesS: Float64Array;
  accelMS2: Float64Array;
  velocityMS: Float64Array;
  displacementM: Float64Array;
}

/**
 * Cumulative trapezoidal rule from rest, y[0] = 0 and y[i] = y[i−1] + Δt·(f[i−1] + f[i])/2
 * (common practice; e.g. Press et al., Numerical Recipes, 3rd ed., §4.1, the extended trapezoidal
 * rule applied step by step).
 */
export function integrateTrapezoidal(samples: ArrayLike<number>, dtS: number): Float64Array {
  const out = new Float64Array(samples.length);
  for (let i = 1; i < samples.length; i++) out[i] = out[i - 1] + (dtS * (samples[i - 1] + samples[i])) / 2;
  return out;
}

/** Acceleration, velocity and displacement at t = 0, Δt, 2Δt, …: the last two integrated from rest. */
export function groundHistories(accelMS2: ArrayLike<number>, dtS: number): GroundHistories {
  const accel = Float64Array.from(accelMS2);
  const velocityMS = integrateTrapezoidal(accel, dtS);
  const displacementM = integrateTrapezoidal(velocityMS, dtS);
  const timesS = accel.map((_, i) => i * dtS);
  return { timesS, accelMS2: accel, velocityMS, displacementM };
}

/** Index of the largest absolute value (the first one, if it repeats). */
export function peakIndex(values: ArrayLike<number>): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if (Math.abs(values[i]) > Math.abs(values[best])) best = i;
  return best;
}
