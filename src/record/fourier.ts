import FFT from 'fft.js';
import { usageError } from '../base/errors.js';

/**
 * One-sided Fourier amplitude spectrum: Δt times the DFT, approximating ∫a(t)e^{−2πift}dt (Brigham,
 * The Fast Fourier Transform and its Applications, 1988, §6.1), zero-padded to a power of two N
 * (`transformLength`; fft.js, Cooley and Tukey 1965). Amplitudes in m/s (acceleration × time) at
 * k/(N·Δt) Hz, k = 0 … N/2.
 */
export function fourierAmplitudeSpectrum(values: Float64Array, dtS: number) {
  let size = 2;
  while (size < values.length) size *= 2;
  const input = new Float64Array(size);
  input.set(values);
  const out = new Float64Array(2 * size);
  new FFT(size).realTransform(out, input);
  const half = size / 2;
  const frequenciesHz = new Float64Array(half + 1);
  const amplitudeMS = new Float64Array(half + 1);
  for (let k = 0; k <= half; k++) {
    frequenciesHz[k] = k / (size * dtS);
    amplitudeMS[k] = dtS * Math.hypot(out[2 * k], out[2 * k + 1]);
  }
  return { frequenciesHz, amplitudeMS, transformLength: size };
}

/** The usual bandwidth coefficient of the Konno–Ohmachi window. */
export const KONNO_OHMACHI_DEFAULT_B = 40;

/** The Konno–Ohmachi window [sin(b·log10(f/f_c)) / (b·log10(f/f_c))]⁴ (BSSA 88(1), eq. 4); 0 at f ≤ 0. */
export function konnoOhmachiWeight(frequencyHz: number, centreHz: number, b = KONNO_OHMACHI_DEFAULT_B) {
  if (frequencyHz <= 0 || centreHz <= 0) return 0;
  const x = b * Math.log10(frequencyHz / centreHz);
  if (x === 0) return 1;
  const s = Math.sin(x) / x;
  return s * s * s * s;
}

/** The window is summed out to |b·log10(f/f_c)| = 4π (past its third side lobe, weight < 4·10⁻⁵). */
const WINDOW_REACH = 4 * Math.PI;

/**
 * Konno and Ohmachi (1998) smoothing: Σ W(f_i; f_c)·A_i / Σ W(f_i; f_c) at each centre, by default
 * each positive frequency of `frequenciesHz` (ascending).
 */
export function konnoOhmachiSmooth(
  frequenciesHz: Float64Array,
  amplitudes: Float64Array,
  options: { bandwidth?: number; centresHz?: Float64Array } = {},
): Float64Array {
  const b = options.bandwidth ?? KONNO_OHMACHI_DEFAULT_B;
  if (!Number.isFinite(b) || b <= 0)
    throw usageError(`the Konno–Ohmachi b must be a positive number, got ${b}`);
  const centres = options.centresHz ?? frequenciesHz.filter((f) => f > 0);
  const ratio = 10 ** (WINDOW_REACH / b);
  const out = new Float64Array(centres.length);
  for (let c = 0; c < centres.length; c++) {
    const fc = centres[c];
    let i = lowerBound(frequenciesHz, fc / ratio);
    let sum = 0;
    let weights = 0;
    for (; i < frequenciesHz.length && frequenciesHz[i] <= fc * ratio; i++) {
      const w = konnoOhmachiWeight(frequenciesHz[i], fc, b);
      sum += w * amplitudes[i];
      weights += w;
    }
    out[c] = weights > 0 ? sum / weights : 0;
  }
  return out;
}

function lowerBound(sorted: Float64Array, value: number): number {
  let lo = 0;
  let hi = sorted.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (sorted[mid] < value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
