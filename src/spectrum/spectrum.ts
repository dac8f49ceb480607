import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { dampingWarnings, periodWarnings } from '../oscillator/grid.js';
import type { Method } from '../oscillator/recurrence.js';
import { type Peaks, type SweepOptions, sweepOscillators } from '../oscillator/sweep.js';
import { warningStep } from '../record/reading.js';
import type { GroundRecord, ProcessingStep } from '../record/record.js';
import type { ParallelSweepOptions } from '../threads/sweep-pool.js';

/** The response spectra of one record at one damping ratio. All arrays are indexed by period. */
export interface SpectrumCurve {
  /** Damping ratio, fraction of critical. */
  damping: number;
  /** Peak relative displacement SD, m. */
  sdM: Float64Array;
  /** Pseudo-velocity PSV = ω·SD, m/s. */
  psvMS: Float64Array;
  /** Pseudo-acceleration PSA = ω²·SD, m/s² (PGA at T = 0). */
  psaMS2: Float64Array;
  /** Peak relative velocity SV, m/s. */
  svMS: Float64Array;
  /** Peak absolute acceleration SA, m/s². */
  saMS2: Float64Array;
}

/** What a spectrum says about the record it came from. */
export interface SpectrumRecordInfo {
  name: string;
  source: string;
  npts: number;
  dtS: number;
  pgaMS2: number;
  processing: readonly ProcessingStep[];
}

/** Response spectra of one record over a period grid and several damping ratios. */
export interface Spectrum {
  record: SpectrumRecordInfo;
  method: Method;
  periodsS: Float64Array;
  curves: SpectrumCurve[];
  /** Oscillator-steps the sweep executed (sub-steps included). */
  oscillatorSteps: number;
}

export type SpectrumOptions = Pick<SweepOptions, 'periodsS' | 'dampings' | 'method'>;

/** Sweep the record's oscillators and assemble SD, PSV, PSA, SV and SA for each damping ratio. */
export function responseSpectrum(record: GroundRecord, options: SpectrumOptions): Spectrum {
  return assembleSpectrum(record, sweepOscillators(record.accelMS2, record.dtS, options));
}

export { PARALLEL_MIN_OSCILLATOR_STEPS } from '../oscillator/plan.js';

export type ParallelSpectrumOptions = SpectrumOptions & Pick<ParallelSweepOptions, 'kernel' | 'threads'>;

/**
 * responseSpectrum with its sweep split over threads as `threads` says (sweepOscillatorsParallel);
 * the numbers are the same bits whatever the threads.
 */
export async function responseSpectrumParallel(
  record: GroundRecord,
  options: ParallelSpectrumOptions,
): Promise<Spectrum> {
  // The thread modules load only for a parallel spectrum.
  const { sweepOscillatorsParallel } = await import('../threads/sweep-pool.js');
  return assembleSpectrum(record, await sweepOscillatorsParallel(record.accelMS2, record.dtS, options));
}

/**
 * Oscillator-steps (periods × dampings × samples, each stepping every rotation) from which RotD
 * is dealt out over threads: a worker costs about as much to start as 1,000,000 such steps of the
 * WebAssembly loop.
 */
export const ROTD_PARALLEL_MIN_STEPS = 1_000_000;

/** Threads for a RotD job: all cores (undefined) from ROTD_PARALLEL_MIN_STEPS, else this one alone. */
export function rotdThreads(periods: number, dampings: number, samples: number): number | undefined {
  return periods * dampings * samples >= ROTD_PARALLEL_MIN_STEPS ? undefined : 1;
}

/** Turn a sweep's peaks into spectra: PSV = ωSD and PSA = ω²SD (PSA = PGA at T = 0). */
export function assembleSpectrum(record: GroundRecord, peaks: Peaks): Spectrum {
  const n = peaks.periodsS.length;
  const curves = Array.from(peaks.dampings, (damping, d): SpectrumCurve => {
    const sdM = peaks.sdM.slice(d * n, (d + 1) * n);
    const svMS = peaks.svMS.slice(d * n, (d + 1) * n);
    const saMS2 = peaks.saMS2.slice(d * n, (d + 1) * n);
    const psvMS = new Float64Array(n);
    const psaMS2 = new Float64Array(n);
    for (let p = 0; p < n; p++) {
      const t = peaks.periodsS[p];
      if (t === 0) {
        psaMS2[p] = record.pgaMS2;
        continue;
      }
      const omega = (2 * Math.PI) / t;
      psvMS[p] = omega * sdM[p];
      psaMS2[p] = omega * omega * sdM[p];
    }
    return { damping, sdM, psvMS, psaMS2, svMS, saMS2 };
  });
  return {
    record: recordInfo(record, peaks.dampings, peaks.periodsS),
    method: peaks.method,
    periodsS: peaks.periodsS,
    curves,
    oscillatorSteps: peaks.oscillatorSteps,
  };
}

/**
 * What outputs say about the record a spectrum came from. With the dampings swept, a damping above
 * the range the accuracy rule was measured over (dampingWarnings) is added to its processing list
 * as a warning, so that every output of the spectrum carries it as it carries the reader's warnings;
 * so are periods longer than the record (periodWarnings).
 */
export function recordInfo(
  record: GroundRecord,
  dampings: ArrayLike<number> = [],
  periodsS: ArrayLike<number> = [],
): SpectrumRecordInfo {
  const durationS = (record.accelMS2.length - 1) * record.dtS;
  const warnings = [...dampingWarnings(dampings), ...periodWarnings(periodsS, durationS)].map((text) =>
    warningStep(text),
  );
  return {
    name: record.name,
    source: record.source,
    npts: record.accelMS2.length,
    dtS: record.dtS,
    pgaMS2: record.pgaMS2,
    processing: warnings.length === 0 ? record.processing : [...record.processing, ...warnings],
  };
}

/** PSA in g, for outputs. */
export function psaG(curve: SpectrumCurve): Float64Array {
  return curve.psaMS2.map((value) => value / STANDARD_GRAVITY_MS2);
}
