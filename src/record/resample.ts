import { usageError } from '../base/errors.js';
import { zeroPhaseFilter } from './filter.js';

/** Half-width of the interpolation kernel, in input samples. */
export const LANCZOS_LOBES = 8;
/** Order of the anti-alias Butterworth low-pass applied before a coarser step. */
export const ANTI_ALIAS_ORDER = 8;
/** Anti-alias corner as a fraction of the new Nyquist frequency. */
const ANTI_ALIAS_FRACTION = 0.8;

/**
 * Resample to step `newDtS` over the same duration by a Lanczos-windowed sinc, weights summing to 1
 * (Duchon 1979, J. Appl. Meteorology 18; Smith and Gossett 1984). A coarser step is low-passed first
 * (−6 dB at `antiAliasHz`, about −31 dB at the new Nyquist; null for a finer step).
 */
export function resampleHistory(values: Float64Array, dtS: number, newDtS: number) {
  if (!Number.isFinite(newDtS) || newDtS <= 0)
    throw usageError(`the resampling step must be a positive number of seconds, got ${newDtS}`);
  const durationS = (values.length - 1) * dtS;
  const count = Math.floor(durationS / newDtS + 1e-9) + 1;
  if (count < 2)
    throw usageError(`a resampling step of ${newDtS} s leaves fewer than 2 samples in ${durationS} s`);
  const antiAliasHz = newDtS > dtS ? ANTI_ALIAS_FRACTION / (2 * newDtS) : null;
  const source =
    antiAliasHz === null
      ? values
      : zeroPhaseFilter(values, dtS, { kind: 'lowpass', order: ANTI_ALIAS_ORDER, highCornerHz: antiAliasHz });
  const out = new Float64Array(count);
  const a = LANCZOS_LOBES;
  for (let j = 0; j < count; j++) {
    const position = (j * newDtS) / dtS;
    const nearest = Math.round(position);
    if (Math.abs(position - nearest) < 1e-9 && nearest < source.length) {
      out[j] = source[nearest];
      continue;
    }
    const first = Math.max(0, Math.floor(position) - a + 1);
    const last = Math.min(source.length - 1, Math.floor(position) + a);
    let sum = 0;
    let weights = 0;
    for (let k = first; k <= last; k++) {
      const w = lanczos(position - k, a);
      sum += w * source[k];
      weights += w;
    }
    out[j] = sum / weights;
  }
  return { values: out, antiAliasHz };
}

/** Lanczos kernel sinc(x)·sinc(x/a) for |x| < a, else 0. */
export function lanczos(x: number, a: number): number {
  if (x === 0) return 1;
  if (Math.abs(x) >= a) return 0;
  const px = Math.PI * x;
  return (a * Math.sin(px) * Math.sin(px / a)) / (px * px);
}
