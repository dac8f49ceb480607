import { formatNumber } from '../base/numbers.js';
import type { AxisSpec } from './panel.js';

/** What a spectrum's horizontal axis shows: period T in s, or frequency f = 1/T in Hz. */
export type PeriodAxis = 'period' | 'frequency';

export const PERIOD_AXES: readonly PeriodAxis[] = ['period', 'frequency'];

/**
 * The x axis of a figure whose series are given by period: period T (s), or frequency f = 1/T (Hz)
 * drawn as the reciprocal of the same data (so T = 0, the PGA point, is left off; figures state
 * its value in a note). Higher frequencies lie to the right.
 */
export function periodAxisSpec(axis: PeriodAxis = 'period'): AxisSpec {
  return axis === 'frequency'
    ? { title: 'Frequency f = 1/T (Hz)', reciprocal: true }
    : { title: 'Period T (s)' };
}

/** A period as it is named on the figure's axis: "T_b = 0.5 s", or "f_b = 2 Hz (T_b = 0.5 s)". */
export function periodLabel(symbol: string, periodS: number, axis: PeriodAxis = 'period'): string {
  const period = `T${symbol} = ${periodS} s`;
  return axis === 'frequency' ? `f${symbol} = ${formatNumber(1 / periodS)} Hz (${period})` : period;
}
