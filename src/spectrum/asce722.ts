import { formatNumber } from '../base/numbers.js';
import { type Asce716Parameters, asceTwoPeriodShape, checkPeriod, type DesignSpectrum } from './design.js';
import { type SpectrumTable, tableSpectrum } from './design-table.js';

/** The two forms of the ASCE/SEI 7-22 design spectrum (§11.4.5). */
export type Asce722Form = 'two-period' | 'multi-period';

/**
 * The two-period design response spectrum of ASCE/SEI 7-22 §11.4.5.2 (Figure 11.4-1), 5% damping,
 * from S_DS, S_D1 and T_L:
 *
 *   T < T₀:          S_a = S_DS (0.4 + 0.6 T/T₀)
 *   T₀ ≤ T ≤ T_S:    S_a = S_DS
 *   T_S < T ≤ T_L:   S_a = S_D1 / T
 *   T > T_L:         S_a = S_D1 T_L / T²
 *
 * with T₀ = 0.2 S_D1/S_DS and T_S = S_D1/S_DS: the shape of ASCE/SEI 7-16 §11.4.6, which the 2022
 * edition keeps for its two-period form (from memory), so both are drawn by asceTwoPeriodShape.
 * S_DS and S_D1 are the engineer's (in 7-22 they come with the site's multi-period values); the
 * tool does not derive them.
 */
export function asce722TwoPeriodSpectrum(parameters: Asce716Parameters): DesignSpectrum {
  const { sdsG, sd1G, tlS } = parameters;
  const shape = asceTwoPeriodShape(parameters, 'ASCE 7-22');
  return {
    code: 'asce7-22',
    description: `ASCE/SEI 7-22 §11.4.5.2 two-period design spectrum, 5% damping: S_DS = ${sdsG} g, S_D1 = ${sd1G} g, T_L = ${tlS} s (T0 = ${formatNumber(shape.t0S)} s, TS = ${formatNumber(shape.tsS)} s)`,
    parameters: { form: 'two-period', sds_g: sdsG, sd1_g: sd1G, tl_s: tlS, t0_s: shape.t0S, ts_s: shape.tsS },
    damping: 0.05,
    minPeriodS: 0,
    maxPeriodS: Number.POSITIVE_INFINITY,
    psaG(periodS: number): number {
      checkPeriod(this, periodS);
      return shape.psaG(periodS);
    },
  };
}

/**
 * The multi-period design response spectrum of ASCE/SEI 7-22 §11.4.5.1, 5% damping, given as the
 * site's table of (period s, S_a g) values that the engineer obtained for the site (readSpectrumTable
 * reads it; `source` names the file). It is read as every table is (tableSpectrum: log–log between
 * rows, linear in T after a T = 0 first row; the rule between the listed periods is this tool's,
 * common practice) and refused outside the table's periods: nothing is extrapolated, neither to
 * shorter periods nor beyond the last row.
 */
export function asce722MultiPeriodSpectrum(table: SpectrumTable, source: string): DesignSpectrum {
  const read = tableSpectrum(table, source);
  const { periodsS } = table;
  const last = periodsS.length - 1;
  return {
    ...read,
    code: 'asce7-22',
    description: `ASCE/SEI 7-22 §11.4.5.1 multi-period design spectrum, 5% damping: table ${source}, ${periodsS.length} rows, ${periodsS[0]} s to ${periodsS[last]} s, log–log interpolation${periodsS[0] === 0 ? ' (linear in T below the first positive period)' : ''}`,
    parameters: { form: 'multi-period', source, rows: periodsS.length },
    damping: 0.05,
    // The table's own reading, behind the range check that names this spectrum.
    psaG(periodS: number): number {
      checkPeriod(this, periodS);
      return read.psaG(periodS);
    },
  };
}
