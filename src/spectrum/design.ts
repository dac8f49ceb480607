import { inputError, usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import { defaultPeriodsS } from '../oscillator/grid.js';

/**
 * A design spectrum: pseudo-spectral acceleration in g as a function of the period, over the
 * periods where it is defined. Evaluating it outside [minPeriodS, maxPeriodS] is an error.
 */
export interface DesignSpectrum {
  /** Where it comes from (an ASCE 7-22 spectrum states its form in `parameters.form`). */
  code: 'asce7-16' | 'asce7-22' | 'ec8' | 'table';
  /** True for a vertical spectrum (ASCE/SEI 7 §11.9); horizontal otherwise. */
  vertical?: boolean;
  /** One line for a reviewer: the standard, clause and parameters. */
  description: string;
  /** The defining parameters (g, s, fractions), as written to outputs. */
  parameters: { [name: string]: number | string };
  /** Damping ratio the spectrum is for (fraction of critical), when it states one. */
  damping: number | undefined;
  /** Shortest period where the spectrum is defined, s. */
  minPeriodS: number;
  /** Longest period where the spectrum is defined, s (Infinity if unbounded). */
  maxPeriodS: number;
  /** The periods a tabulated spectrum was given at, s (tables only). */
  tabulatedPeriodsS?: Float64Array;
  /** PSA in g at period T (s); throws outside the defined range. */
  psaG(periodS: number): number;
}

export interface Asce716Parameters {
  /** Design spectral acceleration at short periods S_DS, g. */
  sdsG: number;
  /** Design spectral acceleration at 1 s S_D1, g. */
  sd1G: number;
  /** Long-period transition period T_L, s. */
  tlS: number;
}

/**
 * The design response spectrum of ASCE/SEI 7-16 §11.4.6 (Figure 11.4-1), 5% damping:
 *
 *   T < T₀:          S_a = S_DS (0.4 + 0.6 T/T₀)          (Eq. 11.4-5)
 *   T₀ ≤ T ≤ T_S:    S_a = S_DS
 *   T_S < T ≤ T_L:   S_a = S_D1 / T                        (Eq. 11.4-6)
 *   T > T_L:         S_a = S_D1 T_L / T²                   (Eq. 11.4-7)
 *
 * with T₀ = 0.2 S_D1/S_DS and T_S = S_D1/S_DS. S_DS and S_D1 must be positive and T_L ≥ T_S.
 */
export function asce716Spectrum(parameters: Asce716Parameters): DesignSpectrum {
  const { sdsG, sd1G, tlS } = parameters;
  const shape = asceTwoPeriodShape(parameters, 'ASCE 7-16');
  return {
    code: 'asce7-16',
    description: `ASCE/SEI 7-16 §11.4.6 design spectrum, 5% damping: S_DS = ${sdsG} g, S_D1 = ${sd1G} g, T_L = ${tlS} s (T0 = ${formatNumber(shape.t0S)} s, TS = ${formatNumber(shape.tsS)} s)`,
    parameters: { sds_g: sdsG, sd1_g: sd1G, tl_s: tlS, t0_s: shape.t0S, ts_s: shape.tsS },
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
 * The shape of Figure 11.4-1, shared by ASCE/SEI 7-16 §11.4.6 and the two-period spectrum of
 * ASCE/SEI 7-22 §11.4.5.2 (the equations above): the corner periods and S_a(T) in g, without the
 * range check. `edition` names the standard in the messages.
 */
export function asceTwoPeriodShape(
  parameters: Asce716Parameters,
  edition: string,
): { t0S: number; tsS: number; psaG(periodS: number): number } {
  const { sdsG, sd1G, tlS } = parameters;
  positive('S_DS', sdsG);
  positive('S_D1', sd1G);
  positive('T_L', tlS);
  const t0S = (0.2 * sd1G) / sdsG;
  const tsS = sd1G / sdsG;
  if (tlS < tsS) {
    throw usageError(`${edition}: T_L = ${tlS} s is shorter than T_S = S_D1/S_DS = ${tsS} s`);
  }
  return {
    t0S,
    tsS,
    psaG(periodS: number): number {
      if (periodS < t0S) return sdsG * (0.4 + (0.6 * periodS) / t0S);
      if (periodS <= tsS) return sdsG;
      if (periodS <= tlS) return sd1G / periodS;
      return (sd1G * tlS) / (periodS * periodS);
    },
  };
}

/** Eurocode 8 ground types with a tabulated spectrum (S1 and S2 need special studies). */
export type Ec8Ground = 'A' | 'B' | 'C' | 'D' | 'E';

export const EC8_GROUNDS: readonly Ec8Ground[] = ['A', 'B', 'C', 'D', 'E'];

/**
 * Soil factor S and corner periods T_B, T_C, T_D (s): the recommended values of EN 1998-1:2004
 * Table 3.2 (Type 1, larger-magnitude events) and Table 3.3 (Type 2, M_s ≤ 5.5). A National Annex
 * may set other values.
 */
export const EC8_CORNERS: Readonly<
  Record<1 | 2, Readonly<Record<Ec8Ground, { s: number; tbS: number; tcS: number; tdS: number }>>>
> = {
  1: {
    A: { s: 1.0, tbS: 0.15, tcS: 0.4, tdS: 2.0 },
    B: { s: 1.2, tbS: 0.15, tcS: 0.5, tdS: 2.0 },
    C: { s: 1.15, tbS: 0.2, tcS: 0.6, tdS: 2.0 },
    D: { s: 1.35, tbS: 0.2, tcS: 0.8, tdS: 2.0 },
    E: { s: 1.4, tbS: 0.15, tcS: 0.5, tdS: 2.0 },
  },
  2: {
    A: { s: 1.0, tbS: 0.05, tcS: 0.25, tdS: 1.2 },
    B: { s: 1.35, tbS: 0.05, tcS: 0.25, tdS: 1.2 },
    C: { s: 1.5, tbS: 0.1, tcS: 0.25, tdS: 1.2 },
    D: { s: 1.8, tbS: 0.1, tcS: 0.3, tdS: 1.2 },
    E: { s: 1.6, tbS: 0.05, tcS: 0.25, tdS: 1.2 },
  },
};

/** Longest period of the EN 1998-1 §3.2.2.2 elastic spectrum (Eq. 3.5 holds for T_D ≤ T ≤ 4 s). */
export const EC8_MAX_PERIOD_S = 4;

/**
 * Damping correction factor of EN 1998-1 §3.2.2.2(3), Eq. 3.6: η = √(10/(5 + ξ)) ≥ 0.55, with ξ the
 * viscous damping ratio in percent. `damping` is a fraction of critical (0.05 for 5%).
 */
export function ec8DampingCorrection(damping: number): number {
  if (!(damping >= 0) || !Number.isFinite(damping)) {
    throw usageError(`damping must be a finite ratio ≥ 0, got ${damping}`);
  }
  return Math.max(0.55, Math.sqrt(10 / (5 + 100 * damping)));
}

export interface Ec8Parameters {
  /** 1 or 2 (EN 1998-1 §3.2.2.2(2)). */
  type: 1 | 2;
  ground: Ec8Ground;
  /** Design ground acceleration on type A ground a_g = γ_I a_gR, g. */
  agG: number;
  /** Viscous damping ratio, fraction of critical; default 0.05 (η = 1). */
  damping?: number;
}

/**
 * The horizontal elastic response spectrum of EN 1998-1:2004 §3.2.2.2, Eqs. 3.2–3.5:
 *
 *   0 ≤ T ≤ T_B:     S_e = a_g S [1 + T/T_B (2.5 η − 1)]
 *   T_B ≤ T ≤ T_C:   S_e = 2.5 a_g S η
 *   T_C ≤ T ≤ T_D:   S_e = 2.5 a_g S η T_C/T
 *   T_D ≤ T ≤ 4 s:   S_e = 2.5 a_g S η T_C T_D/T²
 *
 * with S, T_B, T_C, T_D from Table 3.2 (Type 1) or 3.3 (Type 2) and η from Eq. 3.6. The spectrum
 * is not defined beyond 4 s here (the standard points to its Annex A for longer periods).
 */
export function ec8Spectrum(parameters: Ec8Parameters): DesignSpectrum {
  const { type, ground, agG } = parameters;
  const damping = parameters.damping ?? 0.05;
  if (type !== 1 && type !== 2) throw usageError(`Eurocode 8: spectrum type must be 1 or 2, got ${type}`);
  if (!EC8_GROUNDS.includes(ground)) {
    throw usageError(
      `Eurocode 8: ground type '${ground}' has no tabulated spectrum; use A, B, C, D or E (S1 and S2 need special studies)`,
    );
  }
  positive('a_g', agG);
  const eta = ec8DampingCorrection(damping);
  const { s, tbS, tcS, tdS } = EC8_CORNERS[type][ground];
  const plateau = 2.5 * agG * s * eta;
  return {
    code: 'ec8',
    description: `EN 1998-1 §3.2.2.2 horizontal elastic spectrum, Type ${type}, ground ${ground}: a_g = ${agG} g, S = ${s}, T_B = ${tbS} s, T_C = ${tcS} s, T_D = ${tdS} s, ξ = ${formatNumber(100 * damping)}% (η = ${formatNumber(eta)}); recommended Table 3.2/3.3 values`,
    parameters: { type, ground, ag_g: agG, damping, eta, s, tb_s: tbS, tc_s: tcS, td_s: tdS },
    damping,
    minPeriodS: 0,
    maxPeriodS: EC8_MAX_PERIOD_S,
    psaG(periodS: number): number {
      checkPeriod(this, periodS);
      if (periodS <= tbS) return agG * s * (1 + (periodS / tbS) * (2.5 * eta - 1));
      if (periodS <= tcS) return plateau;
      if (periodS <= tdS) return (plateau * tcS) / periodS;
      return (plateau * tcS * tdS) / (periodS * periodS);
    },
  };
}

/** The spectrum at every period of a grid, g. */
export function designPsaG(spectrum: DesignSpectrum, periodsS: ArrayLike<number>): Float64Array {
  return Float64Array.from(periodsS, (periodS) => spectrum.psaG(periodS));
}

/**
 * The periods a design spectrum is given at by default: a table's own rows; otherwise the default
 * grid (defaultPeriodsS) where the spectrum is defined, and the last period where it is defined
 * when that is finite and not on the grid (Eurocode 8's 4 s), so the curve runs to its end.
 */
export function defaultDesignPeriodsS(spectrum: DesignSpectrum): Float64Array {
  if (spectrum.tabulatedPeriodsS !== undefined) return spectrum.tabulatedPeriodsS;
  const periodsS = Array.from(defaultPeriodsS()).filter((t) => coversPeriod(spectrum, t));
  const endS = spectrum.maxPeriodS;
  if (Number.isFinite(endS) && periodsS[periodsS.length - 1] < endS) periodsS.push(endS);
  return Float64Array.from(periodsS);
}

/** Whether `periodS` lies where the spectrum is defined. */
export function coversPeriod(spectrum: DesignSpectrum, periodS: number): boolean {
  return periodS >= spectrum.minPeriodS && periodS <= spectrum.maxPeriodS;
}

/** Throw the one-line refusal of a period where the spectrum is not defined. */
export function checkPeriod(spectrum: DesignSpectrum, periodS: number): void {
  if (!Number.isFinite(periodS) || !coversPeriod(spectrum, periodS)) {
    throw inputError(
      `T = ${periodS} s is outside the ${spectrumName(spectrum)}, defined from ${spectrum.minPeriodS} s to ${spectrum.maxPeriodS} s`,
    );
  }
}

/** The spectrum as a message names it: a table by its file, a code spectrum by its code (and form and file). */
function spectrumName(spectrum: DesignSpectrum): string {
  const { code, parameters } = spectrum;
  if (code === 'table') return `table ${parameters.source}`;
  if (parameters.source !== undefined) return `${code} ${parameters.form} spectrum of ${parameters.source}`;
  return `${code}${spectrum.vertical ? ' vertical' : ''} spectrum`;
}

function positive(name: string, value: number): void {
  if (!(value > 0) || !Number.isFinite(value))
    throw usageError(`${name} must be a positive number, got ${value}`);
}
