import { usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';

/**
 * Butterworth filters (Butterworth 1930, Wireless Engineer 7): the analog prototype of order n,
 * |H(jΩ)|² = 1/(1 + Ω^{2n}), in second-order sections s² + 2 sin((2k − 1)π/(2n)) s + 1 (and s + 1
 * for odd n), made high-pass by s → 1/s, mapped to z by the bilinear transform with the corner
 * prewarped, Ω = tan(π f Δt) / tan(π f_c Δt) (Oppenheim and Schafer, Discrete-Time Signal
 * Processing, 3rd ed., §7.2.2 and §7.3); −3 dB at f_c exactly.
 *
 * The cascade (transposed direct form II) runs forward then backward (zero phase, −6 dB at the
 * corner) over zero pads of 1.5·n/f_c at each end, removed afterwards (Converse and Brady 1992, as
 * discussed by Boore 2005, BSSA 95(2); the length from memory, at each end to be cautious). A
 * band-pass is an order-n high-pass then an order-n low-pass (common practice in strong-motion
 * processing), not the order-2n band transform.
 */

export interface FilterSpec {
  kind: 'highpass' | 'lowpass' | 'bandpass';
  /** Butterworth order n of each pass (≥ 1). */
  order: number;
  /** High-pass corner, Hz (highpass and bandpass). */
  lowCornerHz?: number;
  /** Low-pass corner, Hz (lowpass and bandpass). */
  highCornerHz?: number;
}

/** One second-order section, normalised so a0 = 1: (b0 + b1 z⁻¹ + b2 z⁻²)/(1 + a1 z⁻¹ + a2 z⁻²). */
export type Biquad = { [coefficient in 'b0' | 'b1' | 'b2' | 'a1' | 'a2']: number };

/** Largest Butterworth order accepted; higher orders ring and add nothing for records. */
export const MAX_FILTER_ORDER = 12;

/** Second-order sections of a digital Butterworth low-pass or high-pass (see the module comment). */
export function butterworthSections(
  kind: 'lowpass' | 'highpass',
  order: number,
  cornerHz: number,
  dtS: number,
): Biquad[] {
  const k = Math.tan(Math.PI * cornerHz * dtS);
  const k2 = k * k;
  // The low-pass numerator is k²(1 + z⁻¹)², or k(1 + z⁻¹); the high-pass one (1 − z⁻¹)², or 1 − z⁻¹.
  const low = kind === 'lowpass';
  const sections: Biquad[] = [];
  for (let i = 1; i <= Math.floor(order / 2); i++) {
    const q = 2 * Math.sin(((2 * i - 1) * Math.PI) / (2 * order));
    const a0 = 1 + q * k + k2;
    const b0 = (low ? k2 : 1) / a0;
    sections.push({
      b0,
      b1: (low ? 2 * k2 : -2) / a0,
      b2: b0,
      a1: (2 * k2 - 2) / a0,
      a2: (1 - q * k + k2) / a0,
    });
  }
  if (order % 2 === 1) {
    const a0 = 1 + k;
    const b0 = (low ? k : 1) / a0;
    sections.push({ b0, b1: low ? b0 : -1 / a0, b2: 0, a1: (k - 1) / a0, a2: 0 });
  }
  return sections;
}

/** All sections of a specification, high-pass first, refusing one that is wrong for step `dtS`. */
export function filterSections(spec: FilterSpec, dtS: number): Biquad[] {
  if (!Number.isInteger(spec.order) || spec.order < 1 || spec.order > MAX_FILTER_ORDER)
    throw usageError(`filter order must be a whole number from 1 to ${MAX_FILTER_ORDER}, got ${spec.order}`);
  const nyquistHz = 1 / (2 * dtS);
  const passes: ['highpass' | 'lowpass', string, number | undefined][] = [];
  if (spec.kind !== 'lowpass') passes.push(['highpass', 'high-pass corner', spec.lowCornerHz]);
  if (spec.kind !== 'highpass') passes.push(['lowpass', 'low-pass corner', spec.highCornerHz]);
  for (const [, label, hz] of passes) {
    if (hz === undefined || !Number.isFinite(hz) || hz <= 0)
      throw usageError(`the ${label} must be a positive frequency in Hz, got ${hz}`);
    if (hz >= nyquistHz) {
      throw usageError(
        `the ${label} ${hz} Hz is at or above the Nyquist frequency ${nyquistHz} Hz of a record sampled every ${dtS} s`,
      );
    }
  }
  if (spec.kind === 'bandpass' && spec.lowCornerHz! >= spec.highCornerHz!) {
    throw usageError(
      `a band-pass needs its low corner below its high corner, got ${spec.lowCornerHz}–${spec.highCornerHz} Hz`,
    );
  }
  return passes.flatMap(([kind, , hz]) => butterworthSections(kind, spec.order, hz!, dtS));
}

/** Run the cascade over `values` in place, from the first sample to the last, from rest. */
function runSections(sections: readonly Biquad[], values: Float64Array): void {
  for (const { b0, b1, b2, a1, a2 } of sections) {
    let s1 = 0;
    let s2 = 0;
    for (let i = 0; i < values.length; i++) {
      const x = values[i];
      const y = b0 * x + s1;
      s1 = b1 * x - a1 * y + s2;
      s2 = b2 * x - a2 * y;
      values[i] = y;
    }
  }
}

/** Length of the zero pad at each end, s: 1.5·n/f_c for the lowest corner. */
export function padDurationS(spec: FilterSpec): number {
  const lowest = spec.kind === 'lowpass' ? spec.highCornerHz! : spec.lowCornerHz!;
  return (1.5 * spec.order) / lowest;
}

/**
 * The lowest corner a record of `durationS` may be filtered at: a tenth of 1/duration. Below it the
 * record holds less than a tenth of a cycle of the corner, so the filter removes nothing it can
 * tell from the baseline, while its zero pads (padDurationS) grow past a hundred record lengths.
 */
export function lowestCornerHz(durationS: number): number {
  return 1 / (LOWEST_CORNER_CYCLES * durationS);
}

const LOWEST_CORNER_CYCLES = 10;

export function zeroPhaseFilter(values: Float64Array, dtS: number, spec: FilterSpec): Float64Array {
  const sections = filterSections(spec, dtS);
  const durationS = (values.length - 1) * dtS;
  const lowest = spec.kind === 'lowpass' ? spec.highCornerHz! : spec.lowCornerHz!;
  if (lowest < lowestCornerHz(durationS))
    throw usageError(
      `the ${spec.kind === 'lowpass' ? 'low-pass' : 'high-pass'} corner ${lowest} Hz is below ${Number(lowestCornerHz(durationS).toPrecision(3))} Hz, a tenth of 1/duration of this ${Number(durationS.toPrecision(4))} s record: it cannot act on it`,
    );
  const pad = Math.ceil(padDurationS(spec) / dtS);
  const work = new Float64Array(values.length + 2 * pad);
  work.set(values, pad);
  runSections(sections, work);
  work.reverse();
  runSections(sections, work);
  work.reverse();
  return work.slice(pad, pad + values.length);
}

export function describeFilter(spec: FilterSpec): string {
  const [name, corners] = {
    highpass: ['high-pass', `${spec.lowCornerHz}`],
    lowpass: ['low-pass', `${spec.highCornerHz}`],
    bandpass: ['band-pass', `${spec.lowCornerHz}–${spec.highCornerHz}`],
  }[spec.kind];
  return (
    `${name} Butterworth, order ${spec.order}, ${corners} Hz, zero-phase (forward and backward), ` +
    `zero pads of ${formatNumber(padDurationS(spec), 3)} s at each end; bilinear transform with prewarping`
  );
}
