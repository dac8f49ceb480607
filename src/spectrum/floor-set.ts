import { inputError } from '../base/errors.js';
import type { Method } from '../oscillator/recurrence.js';
import type { GroundRecord } from '../record/record.js';
import { type BuildingMode, type FloorSpectra, floorSpectrum } from './floor.js';
import {
  recordInfo,
  type Spectrum,
  type SpectrumCurve,
  type SpectrumOptions,
  type SpectrumRecordInfo,
} from './spectrum.js';

/**
 * The arithmetic mean of several curves on one grid, point by point: (1/n) Σ_i c_i[p]
 * (common practice for a suite of records, e.g. the mean spectrum of ASCE/SEI 7 Chapter 16).
 */
export function meanCurve(curves: readonly ArrayLike<number>[]): Float64Array {
  const length = checkCurves(curves);
  const mean = new Float64Array(length);
  for (const curve of curves) for (let p = 0; p < length; p++) mean[p] += curve[p];
  for (let p = 0; p < length; p++) mean[p] /= curves.length;
  return mean;
}

/**
 * The envelope of several curves on one grid: the largest of them at each point, max_i c_i[p]
 * (common practice: equipment is designed for the envelope of the floor spectra it may see).
 */
export function envelopeCurve(curves: readonly ArrayLike<number>[]): Float64Array {
  const length = checkCurves(curves);
  return Float64Array.from({ length }, (_, p) => {
    let largest = curves[0][p];
    for (const curve of curves) if (curve[p] > largest) largest = curve[p];
    return largest;
  });
}

function checkCurves(curves: readonly ArrayLike<number>[]): number {
  if (curves.length === 0) throw inputError('no curves to combine: give at least one');
  const length = curves[0].length;
  if (curves.some((c) => c.length !== length))
    throw inputError(`the curves to combine differ in length (${curves.map((c) => c.length).join(', ')})`);
  return length;
}

/** One combination (the mean, or the envelope) of a set of spectra, curve by curve. */
export interface CombinedSpectrum {
  /** The combined PGA, m/s² (the mean, or the largest): what PSA is at T = 0. */
  pgaMS2: number;
  /** One curve per damping ratio, every quantity combined on its own. */
  curves: SpectrumCurve[];
}

/** The mean and the envelope of spectra computed on one grid (periods, dampings, method). */
export interface SpectrumSet {
  periodsS: Float64Array;
  method: Method;
  mean: CombinedSpectrum;
  envelope: CombinedSpectrum;
}

type Combine = (curves: readonly ArrayLike<number>[]) => Float64Array;

/**
 * The mean and the envelope of spectra on the same grid, each quantity (SD, PSV, PSA, SV, SA) point
 * by point. The records may differ in time step and duration; the grid may not. Because SD, PSV
 * and PSA of one period differ by the same factor ω in every spectrum, the combined SD, PSV and
 * PSA keep PSV = ω·SD and PSA = ω²·SD (to rounding).
 */
export function combineSpectra(spectra: readonly Spectrum[]): SpectrumSet {
  if (spectra.length === 0) throw inputError('no spectra to combine: give at least one');
  checkSameGrid(spectra);
  const [first] = spectra;
  const pgas = spectra.map((s) => [s.record.pgaMS2]);
  const combined = (combine: Combine): CombinedSpectrum => ({
    pgaMS2: combine(pgas)[0],
    curves: first.curves.map((curve, d) => {
      const of = (key: keyof Omit<SpectrumCurve, 'damping'>) => combine(spectra.map((s) => s.curves[d][key]));
      return {
        damping: curve.damping,
        sdM: of('sdM'),
        psvMS: of('psvMS'),
        psaMS2: of('psaMS2'),
        svMS: of('svMS'),
        saMS2: of('saMS2'),
      };
    }),
  });
  return {
    periodsS: first.periodsS,
    method: first.method,
    mean: combined(meanCurve),
    envelope: combined(envelopeCurve),
  };
}

function checkSameGrid(spectra: readonly Spectrum[]): void {
  const [first] = spectra;
  const same = (a: ArrayLike<number>, b: ArrayLike<number>) =>
    a.length === b.length && Array.from(a).every((v, i) => v === b[i]);
  const dampings = (s: Spectrum) => s.curves.map((c) => c.damping);
  for (const s of spectra) {
    if (
      s.method !== first.method ||
      !same(s.periodsS, first.periodsS) ||
      !same(dampings(s), dampings(first))
    ) {
      throw inputError(
        `the spectra of ${first.record.name} and ${s.record.name} are not on the same grid (periods, dampings, method); compute them with the same options`,
      );
    }
  }
}

/** The floor spectra of several ground records through one building, with their mean and envelope. */
export interface FloorSpectrumSet extends SpectrumSet {
  /** Each record's floor spectra, in the order given. */
  members: FloorSpectra[];
  /** The ground records they were made from, in the same order. */
  grounds: SpectrumRecordInfo[];
  /** The broadening fraction b applied to each member before they were combined, or null. */
  broadening: number | null;
}

/**
 * The floor spectrum of each ground record through the same one-mode building (floorSpectrum),
 * each broadened first when `broadening` is given, then their mean and envelope (combineSpectra).
 * Broadening comes first so that every value of the envelope is a value of one record's own
 * broadened spectrum; broadening the envelope instead could interpolate, at a window's end,
 * between points that belong to different records, and broadening the mean would widen peaks
 * that the averaging has already lowered.
 */
export function floorSpectrumSet(
  grounds: readonly GroundRecord[],
  building: BuildingMode,
  grid: SpectrumOptions,
  broadening: number | null = null,
): FloorSpectrumSet {
  if (grounds.length === 0) throw inputError('no ground records: give at least one');
  const members = grounds.map((ground) => floorSpectrum(ground, building, grid, broadening));
  return {
    ...combineSpectra(members.map((m) => m.spectrum)),
    members,
    grounds: grounds.map((ground) => recordInfo(ground)),
    broadening,
  };
}

/**
 * A label for each record of a set: its name, or its source where two records share a name (the
 * same base name in two folders), or both with the position when even those repeat.
 */
export function recordLabels(records: readonly { name: string; source: string }[]): string[] {
  const count = (values: string[], v: string) => values.filter((x) => x === v).length;
  const names = records.map((r) => r.name);
  const sources = records.map((r) => r.source);
  return records.map((r, i) => {
    if (count(names, r.name) === 1) return r.name;
    if (count(sources, r.source) === 1) return r.source;
    return `${r.name} (${i + 1})`;
  });
}
