import { usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import { checkPeriod, type DesignSpectrum } from './design.js';

/** The editions of ASCE/SEI 7 whose §11.9 vertical spectrum is built here. */
export type VerticalEdition = 'asce7-16' | 'asce7-22';

/** Site classes by edition: 7-16 has A–F; 7-22 adds BC, CD and DE (ASCE/SEI 7-22 §20.3, from memory). */
export const VERTICAL_SITE_CLASSES: Readonly<Record<VerticalEdition, readonly string[]>> = {
  'asce7-16': ['A', 'B', 'C', 'D', 'E', 'F'],
  'asce7-22': ['A', 'B', 'BC', 'C', 'CD', 'D', 'DE', 'E', 'F'],
};

/**
 * The column of Table 11.9-1 each site class reads: A and B, C, then D, E and F. The 7-22 classes
 * between two of them take the column of the stiffer one (BC with B, CD with C, DE with D): from
 * memory of how the 7-22 table is laid out; check the edition's own table.
 */
const COLUMN: Readonly<Record<string, 0 | 1 | 2>> = {
  A: 0,
  B: 0,
  BC: 0,
  C: 1,
  CD: 1,
  D: 2,
  DE: 2,
  E: 2,
  F: 2,
};

/**
 * ASCE/SEI 7-16 Table 11.9-1 (the same values taken for 7-22; from memory): the vertical
 * coefficient C_v by the MCE_R short-period S_S (rows) and the column of the site class.
 */
const CV_TABLE: readonly [number, readonly [number, number, number]][] = [
  [0.2, [0.7, 0.7, 0.7]],
  [0.3, [0.8, 0.8, 0.9]],
  [0.6, [0.9, 1.0, 1.1]],
  [1.0, [0.9, 1.1, 1.3]],
  [2.0, [0.9, 1.3, 1.5]],
];

/** Longest vertical period of §11.9.2 (beyond it the standard gives no vertical spectrum). */
export const VERTICAL_MAX_PERIOD_S = 2.0;

/** The site class in the form of the tables (upper case), or a refusal naming the edition's classes. */
export function verticalSiteClass(edition: VerticalEdition, text: string): string {
  const siteClass = text.trim().toUpperCase();
  if (!VERTICAL_SITE_CLASSES[edition].includes(siteClass)) {
    throw usageError(
      `site class '${text}' is not one of ${edition}: ${VERTICAL_SITE_CLASSES[edition].join(', ')}`,
    );
  }
  return siteClass;
}

/**
 * The vertical coefficient C_v of ASCE/SEI 7-16 Table 11.9-1 (from memory; 7-22 read the same way):
 * linear in S_S between the rows 0.2, 0.3, 0.6, 1.0 and 2.0, the end rows held beyond them
 * (S_S ≤ 0.2 and S_S ≥ 2.0 in the table's own words).
 */
export function verticalCoefficient(edition: VerticalEdition, ssG: number, siteClass: string): number {
  if (!(ssG >= 0) || !Number.isFinite(ssG)) throw usageError(`S_S must be a number ≥ 0 in g, got ${ssG}`);
  const column = COLUMN[verticalSiteClass(edition, siteClass)];
  const first = CV_TABLE[0];
  const last = CV_TABLE[CV_TABLE.length - 1];
  if (ssG <= first[0]) return first[1][column];
  if (ssG >= last[0]) return last[1][column];
  const upper = CV_TABLE.findIndex(([ss]) => ss >= ssG);
  const [ssLo, lo] = CV_TABLE[upper - 1];
  const [ssHi, hi] = CV_TABLE[upper];
  return lo[column] + ((hi[column] - lo[column]) * (ssG - ssLo)) / (ssHi - ssLo);
}

export interface VerticalParameters {
  edition: VerticalEdition;
  /** Design short-period spectral acceleration S_DS, g (= 2/3 S_MS). */
  sdsG: number;
  /** MCE_R short-period spectral acceleration S_S, g (for C_v). */
  ssG: number;
  siteClass: string;
}

/**
 * The design vertical response spectrum of ASCE/SEI 7-16 §11.9 (7-22 §11.9 the same, from memory),
 * 5% damping: two-thirds of the MCE_R vertical spectrum S_aMv of §11.9.2, which written with
 * S_DS = 2/3 S_MS reads
 *
 *   T_v ≤ 0.025 s:           S_av = 0.3 C_v S_DS
 *   0.025 < T_v ≤ 0.05 s:    S_av = 20 C_v S_DS (T_v − 0.025) + 0.3 C_v S_DS
 *   0.05 < T_v ≤ 0.15 s:     S_av = 0.8 C_v S_DS
 *   0.15 < T_v ≤ 2.0 s:      S_av = 0.8 C_v S_DS (0.15/T_v)^0.75
 *
 * with C_v from Table 11.9-1. It is not defined beyond 2.0 s (refused, as every design spectrum
 * refuses periods outside its range).
 */
export function verticalSpectrum(parameters: VerticalParameters): DesignSpectrum {
  const { edition, sdsG, ssG } = parameters;
  if (!(sdsG > 0) || !Number.isFinite(sdsG)) throw usageError(`S_DS must be a positive number, got ${sdsG}`);
  const siteClass = verticalSiteClass(edition, parameters.siteClass);
  const cv = verticalCoefficient(edition, ssG, siteClass);
  const standard = edition === 'asce7-22' ? 'ASCE/SEI 7-22' : 'ASCE/SEI 7-16';
  const short = 0.3 * cv * sdsG;
  const plateau = 0.8 * cv * sdsG;
  return {
    code: edition,
    vertical: true,
    description: `${standard} §11.9 design vertical spectrum S_av (2/3 of S_aMv, §11.9.2), 5% damping: S_DS = ${sdsG} g, S_S = ${ssG} g, site class ${siteClass}, C_v = ${formatNumber(cv)} (Table 11.9-1)`,
    parameters: { direction: 'vertical', sds_g: sdsG, ss_g: ssG, site_class: siteClass, cv },
    damping: 0.05,
    minPeriodS: 0,
    maxPeriodS: VERTICAL_MAX_PERIOD_S,
    psaG(periodS: number): number {
      checkPeriod(this, periodS);
      if (periodS <= 0.025) return short;
      if (periodS <= 0.05) return 20 * cv * sdsG * (periodS - 0.025) + short;
      if (periodS <= 0.15) return plateau;
      return plateau * (0.15 / periodS) ** 0.75;
    },
  };
}
