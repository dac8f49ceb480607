import { usageError } from '../base/errors.js';
import { formatNumber } from '../base/numbers.js';
import type { DuctilitySpectra } from './ductility.js';
import { type Hysteresis, postYieldRatio } from './hysteresis.js';

/**
 * Published strength-reduction relations R_μ(T, μ): the factor by which the elastic strength may be
 * divided so that a yielding oscillator of period T reaches the ductility μ. They are smoothed fits
 * over many records, drawn beside a record's own R_y as references, not as its prediction.
 */

export const NEWMARK_HALL_LABEL = 'Newmark–Hall (1982)';
// Outputs name the source plainly; that the clause numbers, section and coefficients were written from
// memory, not checked against the text, is recorded in docs/methods-and-verification.md and the tests.
// The §7.11 form and Nassar–Krawinkler's a, b are from memory (docs/methods-and-verification.md);
// outputs name the sources plainly.
export const NEWMARK_HALL_SOURCE =
  'Newmark and Hall (1982), Earthquake Spectra and Design, EERI; in the form of Chopra, Dynamics of Structures, §7.11';
export const NASSAR_KRAWINKLER_LABEL = 'Nassar–Krawinkler (1991)';
export const NASSAR_KRAWINKLER_SOURCE =
  'Nassar and Krawinkler (1991), Seismic demands for SDOF and MDOF systems, John A. Blume Earthquake Engineering Center, Report 95';

/** Newmark–Hall's fixed corner periods: R = 1 below T_a, the equal-energy plateau from T_b, s. */
export const NEWMARK_HALL_TA_S = 1 / 33;
export const NEWMARK_HALL_TB_S = 0.125;

/** How T_c is taken from a record's elastic spectrum, for outputs. */
export const CORNER_PERIOD_RULE =
  "T_c = 2π·PSV_max/PSA_max of the record's elastic spectrum at the same damping (periods > 0): the period where a flat acceleration-sensitive region at PSA_max meets a flat velocity-sensitive region at PSV_max (common practice)";

/** The corner periods of Newmark–Hall for one ductility, s. */
export interface NewmarkHallCorners {
  taS: number;
  tbS: number;
  /** T_c' = T_c·√(2μ − 1)/μ, where the equal-energy plateau ends. */
  tcPrimeS: number;
  tcS: number;
}

/** Newmark–Hall's corners for ductility μ and the spectrum's corner T_c (> T_b). */
export function newmarkHallCorners(ductility: number, tcS: number): NewmarkHallCorners {
  checkDuctility(ductility);
  if (!(tcS > NEWMARK_HALL_TB_S) || !Number.isFinite(tcS))
    throw usageError(`Newmark–Hall: T_c = ${tcS} s must be finite and above T_b = ${NEWMARK_HALL_TB_S} s`);
  const tcPrimeS = (tcS * Math.sqrt(2 * ductility - 1)) / ductility;
  return { taS: NEWMARK_HALL_TA_S, tbS: NEWMARK_HALL_TB_S, tcPrimeS, tcS };
}

/**
 * Newmark–Hall R_μ (NEWMARK_HALL_SOURCE): 1 for T ≤ T_a; rising log–log to √(2μ − 1) at T_b (equal
 * energy); √(2μ − 1) up to T_c'; then μ·T/T_c, a straight log–log line, up to T_c; μ beyond
 * (equal displacement). Where T_c' < T_b (a short T_c with a large μ) the plateau vanishes and the
 * log–log line runs from (T_b, √(2μ − 1)) to (T_c, μ), so R stays continuous.
 */
export function newmarkHallReduction(periodS: number, ductility: number, tcS: number): number {
  const { taS, tbS, tcPrimeS } = newmarkHallCorners(ductility, tcS);
  const energy = Math.sqrt(2 * ductility - 1);
  if (periodS <= taS) return 1;
  if (periodS < tbS) return energy ** (Math.log(periodS / taS) / Math.log(tbS / taS));
  const plateauEndS = Math.max(tcPrimeS, tbS);
  if (periodS <= plateauEndS) return energy;
  if (periodS >= tcS) return ductility;
  return energy * (ductility / energy) ** (Math.log(periodS / plateauEndS) / Math.log(tcS / plateauEndS));
}

/** Nassar–Krawinkler's (α, a, b) as given (from memory), α the post-yield stiffness ratio. */
export const NASSAR_KRAWINKLER_TABLE: readonly { alpha: number; a: number; b: number }[] = [
  { alpha: 0, a: 1.0, b: 0.42 },
  { alpha: 0.02, a: 1.0, b: 0.37 },
  { alpha: 0.1, a: 0.8, b: 0.29 },
];

/** The coefficients at α: linear between the table's rows; above 0.10, the 0.10 row (clamped). */
export function nassarKrawinklerCoefficients(alpha: number): { a: number; b: number; clamped: boolean } {
  if (!(alpha >= 0) || !(alpha < 1)) throw usageError(`Nassar–Krawinkler: α = ${alpha} is outside [0, 1)`);
  const rows = NASSAR_KRAWINKLER_TABLE;
  const last = rows[rows.length - 1];
  if (alpha >= last.alpha) return { a: last.a, b: last.b, clamped: alpha > last.alpha };
  const i = rows.findIndex((row) => row.alpha > alpha) - 1;
  const [lo, hi] = [rows[i], rows[i + 1]];
  const w = (alpha - lo.alpha) / (hi.alpha - lo.alpha);
  return { a: lo.a + w * (hi.a - lo.a), b: lo.b + w * (hi.b - lo.b), clamped: false };
}

/**
 * Nassar–Krawinkler R_μ (NASSAR_KRAWINKLER_SOURCE): R = [c(μ − 1) + 1]^(1/c) with
 * c(T, α) = T^a/(1 + T^a) + b/T. R → μ as T → ∞ (c → 1) and R → 1 as T → 0 (c → ∞); R = 1 at T = 0.
 */
export function nassarKrawinklerReduction(periodS: number, ductility: number, alpha: number): number {
  checkDuctility(ductility);
  const { a, b } = nassarKrawinklerCoefficients(alpha);
  if (periodS === 0) return 1;
  if (!(periodS > 0)) throw usageError(`Nassar–Krawinkler: T = ${periodS} s is not a period ≥ 0`);
  const ta = periodS ** a;
  const c = ta / (1 + ta) + b / periodS;
  return (c * (ductility - 1) + 1) ** (1 / c);
}

/** T_c from an elastic spectrum (CORNER_PERIOD_RULE); SD in m at periods in s; 0-periods skipped. */
export function cornerPeriodFromSpectrum(periodsS: ArrayLike<number>, sdM: ArrayLike<number>): number {
  let psvMax = 0;
  let psaMax = 0;
  for (let p = 0; p < periodsS.length; p++) {
    const t = periodsS[p];
    if (!(t > 0)) continue;
    const omega = (2 * Math.PI) / t;
    psvMax = Math.max(psvMax, omega * sdM[p]);
    psaMax = Math.max(psaMax, omega * omega * sdM[p]);
  }
  return psaMax > 0 ? (2 * Math.PI * psvMax) / psaMax : Number.NaN;
}

/** One published relation drawn for one damping ratio and ductility. */
export interface ReferenceReduction {
  relation: 'newmark-hall' | 'nassar-krawinkler';
  label: string;
  damping: number;
  ductility: number;
  periodsS: Float64Array;
  ry: Float64Array;
}

export interface ReferenceReductions {
  curves: ReferenceReduction[];
  /** T_c used for Newmark–Hall at each damping ratio (NaN where it could not be used), s. */
  cornerPeriodsS: { damping: number; tcS: number }[];
  /** Nassar–Krawinkler's (a, b) at the model's α. */
  nassarKrawinkler: { alpha: number; a: number; b: number; clamped: boolean };
  /** What a reader must know to read the curves: sources, T_c, interpolation, limits. */
  notes: string[];
}

/**
 * Both relations for every curve of constant-ductility spectra with μ > 1, on `samples` periods
 * log-spaced over the spectra's periods above 0 (so the corners are drawn where they are). T_c is
 * `tcS` when given, else CORNER_PERIOD_RULE at each damping ratio.
 */
export function referenceReductions(
  spectra: Pick<DuctilitySpectra, 'periodsS' | 'elastic' | 'curves' | 'model'>,
  options: { tcS?: number; samples?: number } = {},
): ReferenceReductions {
  const positive = Array.from(spectra.periodsS).filter((t) => t > 0);
  const periodsS = logGrid(Math.min(...positive), Math.max(...positive), options.samples ?? 160);
  const alpha = postYieldRatio(spectra.model);
  const nk = { alpha, ...nassarKrawinklerCoefficients(alpha) };
  const cornerPeriodsS = spectra.elastic.map(({ damping, sdM }) => {
    const tcS = options.tcS ?? cornerPeriodFromSpectrum(spectra.periodsS, sdM);
    return { damping, tcS: tcS > NEWMARK_HALL_TB_S ? tcS : Number.NaN };
  });
  const curves: ReferenceReduction[] = [];
  for (const { damping, ductility } of spectra.curves) {
    if (ductility === 1 || positive.length === 0) continue;
    const tcS = cornerPeriodsS.find((c) => c.damping === damping)?.tcS ?? Number.NaN;
    const at = (r: (t: number) => number) => periodsS.map(r);
    if (Number.isFinite(tcS)) {
      // The corners themselves are on the curve's grid, so its kinks are drawn where they are.
      const { taS, tbS, tcPrimeS } = newmarkHallCorners(ductility, tcS);
      const corners = [taS, tbS, Math.max(tcPrimeS, tbS), tcS].filter(
        (t) => t > periodsS[0] && t < periodsS[periodsS.length - 1],
      );
      const grid = Float64Array.from(new Set([...periodsS, ...corners])).sort();
      const ry = grid.map((t) => newmarkHallReduction(t, ductility, tcS));
      curves.push({
        relation: 'newmark-hall',
        label: NEWMARK_HALL_LABEL,
        damping,
        ductility,
        periodsS: grid,
        ry,
      });
    }
    const ry = at((t) => nassarKrawinklerReduction(t, ductility, alpha));
    curves.push({
      relation: 'nassar-krawinkler',
      label: NASSAR_KRAWINKLER_LABEL,
      damping,
      ductility,
      periodsS,
      ry,
    });
  }
  return {
    curves,
    cornerPeriodsS,
    nassarKrawinkler: nk,
    notes: referenceNotes(spectra.model, nk, cornerPeriodsS, options.tcS),
  };
}

function referenceNotes(
  model: Hysteresis,
  nk: ReferenceReductions['nassarKrawinkler'],
  corners: ReferenceReductions['cornerPeriodsS'],
  givenTcS: number | undefined,
): string[] {
  const tc = corners
    .map(
      ({ damping, tcS }) =>
        `${formatNumber(damping * 100, 6)}%: ${Number.isFinite(tcS) ? `${formatNumber(tcS, 3)} s` : 'not above T_b, not drawn'}`,
    )
    .join('; ');
  const nkAlpha =
    model.kind === 'elastoplastic'
      ? 'α = 0 (elastoplastic)'
      : nk.clamped
        ? `α = ${nk.alpha} is above the table's 0.10: the coefficients of α = 0.10 are used`
        : `α = ${nk.alpha}, the coefficients linear in α between the table's rows 0, 0.02, 0.10`;
  return [
    `${NEWMARK_HALL_LABEL}: R = 1 for T ≤ T_a = 1/33 s, √(2μ−1) from T_b = 0.125 s to T_c' = T_c·√(2μ−1)/μ, μ from T_c, log–log between. T_c ${givenTcS === undefined ? `= 2π·PSV_max/PSA_max of the elastic spectrum (common practice)` : 'as given'}: ${tc}. Source: ${NEWMARK_HALL_SOURCE}.`,
    `${NASSAR_KRAWINKLER_LABEL}: R = [c(μ−1)+1]^(1/c), c = T^a/(1+T^a) + b/T, ${nkAlpha}: a = ${formatNumber(nk.a)}, b = ${formatNumber(nk.b)}. Source: ${NASSAR_KRAWINKLER_SOURCE}.`,
    'Both are smoothed fits over many recorded motions at about 5% damping: references for the record’s R_y, not predictions of it.',
  ];
}

function logGrid(fromS: number, toS: number, n: number): Float64Array {
  if (!(fromS < toS)) return Float64Array.of(fromS);
  const step = Math.log(toS / fromS) / (n - 1);
  return Float64Array.from({ length: n }, (_, i) => (i === n - 1 ? toS : fromS * Math.exp(i * step)));
}

function checkDuctility(ductility: number): void {
  if (!(ductility >= 1) || !Number.isFinite(ductility))
    throw usageError(`ductility ${ductility}: a ductility ratio μ is finite and ≥ 1`);
}
