import { usageError } from '../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { fourierAmplitudeSpectrum } from './fourier.js';
import { cumulativeTrapezoid, integrateRecord, trapezoid } from './integrate.js';
import type { GroundRecord } from './record.js';

/** A peak of |x(t)| and the time of its first occurrence. */
export interface Peak {
  value: number;
  timeS: number;
}

/** Ground-motion measures of one record (SI units throughout). */
export interface GroundMotionMeasures {
  /** Peaks of acceleration, m/s², velocity, m/s, and displacement, m. */
  pga: Peak;
  pgv: Peak;
  pgd: Peak;
  /** Arias intensity, m/s. */
  ariasMS: number;
  /** Significant durations, s, and the times that bound them. */
  d5to75S: number;
  d5to95S: number;
  t5S: number;
  t75S: number;
  t95S: number;
  /** Bracketed duration above the threshold, s (0 if never reached), and its bounds (null then). */
  bracketedS: number;
  bracketStartS: number | null;
  bracketEndS: number | null;
  bracketThresholdMS2: number;
  /** Cumulative absolute velocity, m/s. */
  cavMS: number;
  /** Mean period, s (null if the band 0.25–20 Hz holds no Fourier line). */
  meanPeriodS: number | null;
  /** The band actually used for the mean period, Hz (20 Hz is cut to the Nyquist frequency). */
  meanPeriodBandHz: [number, number];
}

function peakOf(values: Float64Array, dtS: number): Peak {
  let index = 0;
  for (let i = 1; i < values.length; i++) if (Math.abs(values[i]) > Math.abs(values[index])) index = i;
  return { value: Math.abs(values[index]), timeS: index * dtS };
}

/** Arias intensity I_a = π/(2g) ∫ a(t)² dt, m/s (Arias 1970, in Seismic Design for Nuclear Power Plants). */
export function ariasIntensity(accelMS2: Float64Array, dtS: number): number {
  return (Math.PI / (2 * STANDARD_GRAVITY_MS2)) * trapezoid(squares(accelMS2), dtS);
}

/** The Husid curve H(t) = ∫₀ᵗ a² dτ / ∫₀ᵀ a² dτ, 0 to 1 (Husid 1969); all zeros for a record of zeros. */
export function husidCurve(accelMS2: Float64Array, dtS: number): Float64Array {
  const running = cumulativeTrapezoid(squares(accelMS2), dtS);
  const total = running[running.length - 1];
  if (total > 0) for (let i = 0; i < running.length; i++) running[i] /= total;
  return running;
}

/**
 * First time a rising curve reaches `level`, interpolated. On the Husid curve, D5–95 is the time from
 * 0.05 to 0.95 (Trifunac and Brady 1975, BSSA 65(3); D5–75 as in Abrahamson and Silva 1996).
 */
export function timeToReach(curve: Float64Array, dtS: number, level: number): number {
  const i = curve.findIndex((h) => h >= level);
  if (i === -1) return (curve.length - 1) * dtS;
  if (i === 0) return 0;
  const rise = curve[i] - curve[i - 1];
  return (i - 1 + (rise > 0 ? (level - curve[i - 1]) / rise : 1)) * dtS;
}

/** Bracketed duration: first to last sample with |a| ≥ threshold, or 0 (Bolt 1973, Proc. 5th WCEE). */
export function bracketedDuration(accelMS2: Float64Array, dtS: number, thresholdMS2: number) {
  if (!Number.isFinite(thresholdMS2) || thresholdMS2 <= 0)
    throw usageError(`the bracketed-duration threshold must be positive, got ${thresholdMS2} m/s²`);
  const first = accelMS2.findIndex((a) => Math.abs(a) >= thresholdMS2);
  if (first < 0) return { durationS: 0, startS: null, endS: null };
  let last = accelMS2.length - 1;
  while (!(Math.abs(accelMS2[last]) >= thresholdMS2)) last--;
  return { durationS: (last - first) * dtS, startS: first * dtS, endS: last * dtS };
}

/** CAV = ∫|a(t)| dt, m/s (EPRI 1988, NP-5930; without the 0.025 g screening of later versions). */
export function cumulativeAbsoluteVelocity(accelMS2: Float64Array, dtS: number): number {
  return trapezoid(accelMS2.map(Math.abs), dtS);
}

/**
 * Mean period T_m = Σ (C_i²/f_i) / Σ C_i² over the Fourier amplitudes at 0.25 ≤ f_i ≤ 20 Hz, 20 Hz
 * cut to the Nyquist (Rathje, Abrahamson and Bray 1998, J. Geotech. Geoenv. Eng. 124(2), eq. 3).
 */
export function meanPeriod(accelMS2: Float64Array, dtS: number) {
  const { frequenciesHz, amplitudeMS } = fourierAmplitudeSpectrum(accelMS2, dtS);
  const bandHz: [number, number] = [0.25, Math.min(20, 1 / (2 * dtS))];
  let numerator = 0;
  let denominator = 0;
  for (let i = 0; i < frequenciesHz.length; i++) {
    const f = frequenciesHz[i];
    if (f < bandHz[0] || f > bandHz[1]) continue;
    const c2 = amplitudeMS[i] * amplitudeMS[i];
    numerator += c2 / f;
    denominator += c2;
  }
  return { periodS: denominator > 0 ? numerator / denominator : null, bandHz };
}

/** All the measures of a record; `bracketThresholdMS2`, m/s², defaults to 0.05 g. */
export function groundMotionMeasures(
  record: GroundRecord,
  options: { bracketThresholdMS2?: number } = {},
): GroundMotionMeasures {
  const { dtS, accelMS2 } = record;
  const { velocityMS, displacementM } = integrateRecord(record);
  const husid = husidCurve(accelMS2, dtS);
  const [t5S, t75S, t95S] = [0.05, 0.75, 0.95].map((level) => timeToReach(husid, dtS, level));
  const bracketThresholdMS2 = options.bracketThresholdMS2 ?? 0.05 * STANDARD_GRAVITY_MS2;
  const bracket = bracketedDuration(accelMS2, dtS, bracketThresholdMS2);
  const mean = meanPeriod(accelMS2, dtS);
  return {
    pga: peakOf(accelMS2, dtS),
    pgv: peakOf(velocityMS, dtS),
    pgd: peakOf(displacementM, dtS),
    ariasMS: ariasIntensity(accelMS2, dtS),
    d5to75S: t75S - t5S,
    d5to95S: t95S - t5S,
    t5S,
    t75S,
    t95S,
    bracketedS: bracket.durationS,
    bracketStartS: bracket.startS,
    bracketEndS: bracket.endS,
    bracketThresholdMS2,
    cavMS: cumulativeAbsoluteVelocity(accelMS2, dtS),
    meanPeriodS: mean.periodS,
    meanPeriodBandHz: mean.bandHz,
  };
}

function squares(values: Float64Array): Float64Array {
  return values.map((v) => v * v);
}
