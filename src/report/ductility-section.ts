import { CAUTION } from '../base/caution.js';
import { LENGTH_UNITS, type LengthUnit } from '../base/units.js';
import { dampingLabel } from '../formats/layout.js';
import { constantDuctilitySpectra, type DuctilitySpectra } from '../inelastic/ductility.js';
import { describeHysteresis, type Hysteresis, postYieldRatio } from '../inelastic/hysteresis.js';
import {
  CORNER_PERIOD_RULE,
  nassarKrawinklerReduction,
  newmarkHallReduction,
  type ReferenceReductions,
  referenceReductions,
} from '../inelastic/r-mu-t.js';
import { ductilityFigures, type PeriodAxis } from '../plot/index.js';
import type { GroundRecord } from '../record/record.js';
import type { Cell, ReportFigure } from './html.js';
import { definitionTable, formatNumber, list, paragraph, span, table } from './html.js';

/** What the report's inelastic section is asked for: target ductilities, the model, its periods. */
export interface DuctilityRequest {
  ductilities: readonly number[];
  model: Hysteresis;
  /** The section's own period grid (the yielding search is costly); default the report's periods. */
  periodsS?: Float64Array;
}

/** The inelastic section's content: the spectra, the published relations, the two figures. */
export interface ReportDuctility {
  spectra: DuctilitySpectra;
  references: ReferenceReductions;
  figures: ReportFigure[];
}

const CAPTIONS: Record<string, string> = {
  'ductility-ay.svg': 'Constant-ductility spectra: yield pseudo-acceleration A_y for each target ductility',
  'ductility-ry.svg': 'Strength reduction factor R_y beside the Newmark–Hall and Nassar–Krawinkler relations',
};

/**
 * Constant-ductility spectra of the report's record at one damping ratio, with the published
 * relations and the figures. The one place the report runs the yielding search.
 */
export function reportDuctility(
  record: GroundRecord,
  request: DuctilityRequest,
  grid: { periodsS: Float64Array; damping: number },
  axis: PeriodAxis | undefined,
): ReportDuctility {
  const spectra = constantDuctilitySpectra(record, {
    periodsS: request.periodsS ?? grid.periodsS,
    dampings: [grid.damping],
    ductilities: request.ductilities,
    model: request.model,
  });
  const references = referenceReductions(spectra);
  const figures = ductilityFigures(spectra, { references, axis }).map(
    ({ name, svg }): ReportFigure => ({ file: name, caption: CAPTIONS[name] ?? name, svg }),
  );
  return { spectra, references, figures };
}

/** The periods of the short table: about 0.2, 0.5, 1 and 2 s, those the grid reaches. */
function tablePeriods(periodsS: Float64Array): number[] {
  const positive = Array.from(periodsS.keys()).filter((p) => periodsS[p] > 0);
  if (positive.length === 0) return [];
  const nearest = (t: number) =>
    positive.reduce((best, p) =>
      Math.abs(Math.log(periodsS[p] / t)) < Math.abs(Math.log(periodsS[best] / t)) ? p : best,
    );
  const low = periodsS[positive[0]];
  const high = periodsS[positive[positive.length - 1]];
  return [...new Set([0.2, 0.5, 1, 2].filter((t) => t >= low * 0.9 && t <= high * 1.1).map(nearest))];
}

/** The section: the caution, the method and convention, the short table and the figures' notes. */
export function ductilitySection(d: ReportDuctility, lengthUnit: LengthUnit, tableNumber: number): string {
  const { spectra, references } = d;
  const periods = spectra.periodsS;
  const perLength = 1 / LENGTH_UNITS[lengthUnit];
  const tc = references.cornerPeriodsS[0]?.tcS ?? Number.NaN;
  const alpha = postYieldRatio(spectra.model);
  const rows = spectra.curves.flatMap((curve) =>
    tablePeriods(periods).map((p): Cell[] => [
      formatNumber(curve.ductility),
      periods[p],
      curve.ayG[p],
      curve.ry[p],
      curve.uyM[p] * perLength,
      curve.umM[p] * perLength,
      curve.achievedDuctility[p],
      Number.isFinite(tc) ? newmarkHallReduction(periods[p], curve.ductility, tc) : null,
      nassarKrawinklerReduction(periods[p], curve.ductility, alpha),
    ]),
  );
  const positive = Array.from(periods).filter((t) => t > 0);
  return [
    paragraph(CAUTION, 'caution-inline'),
    paragraph(
      "The strength a yielding single-degree-of-freedom oscillator needs so that its peak ductility demand u_m/u_y equals a target μ, period by period, for this record (constant-ductility spectra); R_y = f_o/f_y is the record's own strength reduction factor, drawn beside two published R–μ–T relations.",
    ),
    definitionTable(`Table ${tableNumber}. Yielding oscillators and the strength search`, [
      ['Force–deformation model', describeHysteresis(spectra.model)],
      ['Damping', `${dampingLabel(spectra.elastic[0].damping)} viscous, at the elastic frequency`],
      ['Target ductilities μ', spectra.curves.map((c) => formatNumber(c.ductility)).join(', ')],
      [
        'Periods',
        `${periods.length}, ${span(periods[0], periods[periods.length - 1])}${positive.length < periods.length ? ' (T = 0 included)' : ''}`,
      ],
      ['Step method', spectra.method],
      ['Strength reported', spectra.convention],
      ['Tolerance on μ', `${formatNumber(spectra.tolerance * 100)}% of the target`],
      ['Oscillator runs', String(spectra.oscillatorRuns)],
      [
        'Newmark–Hall corner T_c',
        `${Number.isFinite(tc) ? `${formatNumber(tc, 3)} s` : 'not above 0.125 s: not drawn'}: ${CORNER_PERIOD_RULE}`,
      ],
    ]),
    table(
      `Table ${tableNumber + 1}. Constant-ductility strengths at selected periods (${dampingLabel(spectra.elastic[0].damping)})`,
      [
        'μ',
        'T (s)',
        'A_y (g)',
        'R_y (–)',
        `u_y (${lengthUnit})`,
        `u_m (${lengthUnit})`,
        'Achieved μ (–)',
        'Newmark–Hall R (–)',
        'Nassar–Krawinkler R (–)',
      ],
      rows,
    ),
    list(references.notes),
  ].join('\n');
}

/** The method statement of the inelastic section (its table states the method and rule in full). */
export function ductilityMethodStatement(spectra: DuctilitySpectra): string {
  return `Inelastic response: ${describeHysteresis(spectra.model)} oscillators at ζ = ${dampingLabel(spectra.elastic[0].damping)}, Newmark average acceleration with Newton–Raphson iterations; for each target ductility the largest yield strength whose ductility demand is within ${formatNumber(spectra.tolerance * 100)}% of it (the method and the search in full in the Inelastic response section).`;
}

/** The limit of use the inelastic section adds. */
export const DUCTILITY_LIMIT =
  'Inelastic response: one yielding oscillator per period, non-degrading elastoplastic or bilinear hysteresis, no P-Δ, no higher modes; constant-ductility strengths of one record scatter widely from record to record and are not design strengths or code R factors.';
