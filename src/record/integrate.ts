/**
 * Running trapezoidal integral from `initial` (common practice; Press et al., Numerical Recipes, 3rd
 * ed., §4.1), exact for histories linear between samples; every running integral of quakesweep.
 */
export function cumulativeTrapezoid(values: Float64Array, dtS: number, initial = 0): Float64Array {
  const out = new Float64Array(values.length);
  if (values.length === 0) return out;
  out[0] = initial;
  const half = dtS / 2;
  for (let i = 1; i < values.length; i++) out[i] = out[i - 1] + half * (values[i - 1] + values[i]);
  return out;
}

/** The total integral of `values` at step `dtS` by the trapezoidal rule (common practice). */
export function trapezoid(values: Float64Array, dtS: number): number {
  let sum = 0;
  for (let i = 1; i < values.length; i++) sum += values[i - 1] + values[i];
  return (sum * dtS) / 2;
}

/** Acceleration, velocity, m/s, and displacement, m, from rest; no baseline removed (ask in processing). */
export function integrateRecord(record: { accelMS2: Float64Array; dtS: number }) {
  const velocityMS = cumulativeTrapezoid(record.accelMS2, record.dtS);
  const displacementM = cumulativeTrapezoid(velocityMS, record.dtS);
  return { accelMS2: record.accelMS2, velocityMS, displacementM };
}
