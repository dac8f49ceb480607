import { usageError } from '../base/errors.js';

/**
 * Ramp the first and last `fraction` (0 to 0.5) of the samples up from 0 by a half cosine (Tukey
 * window; Tukey 1967, Harris 1978, Proc. IEEE 66(1), §V.B); the middle is left untouched.
 */
export function cosineTaper(values: Float64Array, fraction: number): Float64Array {
  if (!Number.isFinite(fraction) || fraction < 0 || fraction > 0.5) {
    throw usageError(
      `the taper must be between 0% and 50% of the record at each end, got ${fraction * 100}%`,
    );
  }
  const n = values.length;
  const out = Float64Array.from(values);
  const width = Math.floor(fraction * (n - 1));
  if (width === 0) return out;
  for (let i = 0; i < width; i++) {
    const w = 0.5 * (1 - Math.cos((Math.PI * i) / width));
    out[i] *= w;
    out[n - 1 - i] *= w;
  }
  return out;
}
