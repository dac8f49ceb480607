import { LENGTH_UNITS, type LengthUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { dampingLabel } from '../formats/layout.js';
import type { GroundMotionMeasures } from '../record/measures.js';
import { PROCESSING_ORDER } from '../record/process.js';
import { appliedSteps, stepText } from '../record/reading.js';
import type { GroundRecord } from '../record/record.js';
import type { DampingComparison } from '../spectrum/damping.js';
import type { RotDSpectra } from '../spectrum/rotd.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import type { TargetFit } from '../spectrum/target.js';
import type { Cell } from './html.js';
import { definitionTable, escapeHtml, formatNumber, list, paragraph, span, table } from './html.js';
import { USABLE_BAND_RULE, usableBand, usableBandText } from './usable-band.js';

/** What the report says of the record as it was read (before processing). */
export type RecordFacts = Pick<GroundRecord, 'name' | 'source' | 'dtS' | 'accelMS2' | 'unitsRead'>;

const g = STANDARD_GRAVITY_MS2;

export function recordSection(read: RecordFacts, processed: { dtS: number; npts: number }): string {
  const npts = read.accelMS2.length;
  const rows: [string, string][] = [
    ['Name', read.name],
    ['Source file', read.source],
    ['Units read', `${read.unitsRead} (converted to m/s² inside the program)`],
    ['Time step Δt as read', `${formatNumber(read.dtS, 6)} s`],
    ['Samples as read', String(npts)],
    ['Length as read', `${formatNumber((npts - 1) * read.dtS, 6)} s`],
  ];
  if (processed.dtS !== read.dtS || processed.npts !== npts) {
    rows.push(['Time step after processing', `${formatNumber(processed.dtS, 6)} s`]);
    rows.push(['Samples after processing', String(processed.npts)]);
  }
  return definitionTable('Table 1. The record', rows);
}

export function processingSection(
  steps: readonly { operation: string; description: string; parameters?: Record<string, unknown> }[],
): string {
  const none = 'None: the record is used as read (no baseline correction, taper, filter or resampling).';
  const noFilter =
    'Usable period band after filtering: not limited by a filter (the record was not filtered).';
  const parts = steps
    .filter((s) => s.operation === 'read')
    .map((s) => paragraph(`How it was read: ${stepText(s).replace(/\.$/, '')}.`));
  const applied = appliedSteps(steps);
  if (applied.length === 0) parts.push(paragraph(none), paragraph(noFilter, 'usable-band'));
  else {
    const band = usableBand(applied);
    parts.push(
      paragraph(`Applied in this order (the program's fixed order is ${PROCESSING_ORDER.join(' → ')}):`),
      `<ol>\n${applied.map((s) => `<li><strong>${escapeHtml(s.operation)}</strong>: ${escapeHtml(s.description)}</li>`).join('\n')}\n</ol>`,
      paragraph(
        band === null
          ? noFilter
          : `Usable period band after filtering: ${usableBandText(band)}, by the rule ${USABLE_BAND_RULE}.`,
        'usable-band',
      ),
    );
  }
  parts.push(...warningsBlock(steps.filter((s) => s.operation === 'warning').map(stepText)));
  return parts.join('\n');
}

/** A block of warnings a reader cannot miss (none when there are none). */
export function warningsBlock(warnings: readonly string[]): string[] {
  if (warnings.length === 0) return [];
  const items = warnings.map((w) => `<li>${escapeHtml(w)}</li>`).join('\n');
  return [`<div class="warnings" role="note"><strong>Warnings</strong>\n<ul>\n${items}\n</ul></div>`];
}

export function measuresSection(m: GroundMotionMeasures): string {
  const at = (t: number) => `at t = ${formatNumber(t, 5)} s`;
  const rows: Cell[][] = [
    ['Peak ground acceleration PGA', m.pga.value / g, 'g', at(m.pga.timeS)],
    ['Peak ground velocity PGV', m.pgv.value, 'm/s', at(m.pgv.timeS)],
    ['Peak ground displacement PGD', m.pgd.value, 'm', at(m.pgd.timeS)],
    ['Arias intensity I_a', m.ariasMS, 'm/s', 'π/(2g)∫a²dt (Arias 1970)'],
    ['Significant duration D5–75', m.d5to75S, 's', `${span(m.t5S, m.t75S)} (Trifunac and Brady 1975)`],
    ['Significant duration D5–95', m.d5to95S, 's', span(m.t5S, m.t95S)],
    [
      `Bracketed duration (|a| ≥ ${formatNumber(m.bracketThresholdMS2 / g)} g)`,
      m.bracketedS,
      's',
      m.bracketStartS === null
        ? 'threshold never reached'
        : `${span(m.bracketStartS, m.bracketEndS)} (Bolt 1973)`,
    ],
    ['Cumulative absolute velocity CAV', m.cavMS, 'm/s', '∫|a|dt (EPRI 1988), no threshold'],
    [
      'Mean period T_m',
      m.meanPeriodS,
      's',
      `Fourier lines ${formatNumber(m.meanPeriodBandHz[0])}–${formatNumber(m.meanPeriodBandHz[1])} Hz (Rathje, Abrahamson and Bray 1998)`,
    ],
  ];
  const caption = 'Table 2. Ground-motion measures of the processed record';
  return [
    table(caption, ['Measure', 'Value', 'Unit', 'Where / how'], rows),
    paragraph(
      'Velocity and displacement by the trapezoidal rule from rest, after the processing of section 2.',
      'note',
    ),
  ].join('\n');
}

/** Index of the grid period nearest to `t` (the first of two as near). */
function nearest(periodsS: Float64Array, t: number): number {
  return periodsS.reduce(
    (best, period, p) => (Math.abs(period - t) < Math.abs(periodsS[best] - t) ? p : best),
    0,
  );
}

export function peaksSection(spectrum: Spectrum, lengthUnit: LengthUnit, tableNumber: number): string {
  const perLength = 1 / LENGTH_UNITS[lengthUnit];
  const periods = spectrum.periodsS;
  const short = nearest(periods, 0.2);
  const long = nearest(periods, 1);
  // The largest value at a period above 0 (the first of equals), converted, and its period.
  const peak = (values: Float64Array, convert: (value: number) => number): Cell[] => {
    const p = values.reduce(
      (best, v, i) => (periods[i] > 0 && (best < 0 || v > values[best]) ? i : best),
      -1,
    );
    return [convert(values[Math.max(p, 0)]), periods[Math.max(p, 0)]];
  };
  const rows = spectrum.curves.map((curve): Cell[] => [
    dampingLabel(curve.damping),
    ...peak(curve.psaMS2, (v) => v / g),
    curve.psaMS2[short] / g,
    curve.psaMS2[long] / g,
    ...peak(curve.sdM, (v) => v * perLength),
    ...peak(curve.psvMS, (v) => v * perLength),
  ]);
  return table(
    `Table ${tableNumber}. Peak spectral values (grid of ${periods.length} periods, ${span(periods[0], periods[periods.length - 1])})`,
    [
      'Damping ζ',
      'Peak PSA (g)',
      'at T (s)',
      `PSA at T = ${formatNumber(periods[short])} s (g)`,
      `PSA at T = ${formatNumber(periods[long])} s (g)`,
      `Peak SD (${lengthUnit})`,
      'at T (s)',
      `Peak PSV (${lengthUnit}/s)`,
      'at T (s)',
    ],
    rows,
  );
}

export function dampingSection(comparison: DampingComparison, tableNumber: number): string {
  const rows = comparison.curves.map((curve): Cell[] => [
    dampingLabel(curve.damping),
    curve.geometricMeanRatio,
    curve.published.ec8Eta,
    curve.published.newmarkHall.acceleration,
    curve.published.newmarkHall.velocity,
    curve.published.newmarkHall.displacement,
  ]);
  return [
    table(
      `Table ${tableNumber}. PSA(ζ)/PSA(${dampingLabel(comparison.referenceDamping)}): this record beside published factors`,
      [
        'Damping ζ',
        'Record, geometric mean over T > 0 (–)',
        'EC8 η(ζ)/η(5%) (–)',
        'Newmark–Hall, acceleration (–)',
        'Newmark–Hall, velocity (–)',
        'Newmark–Hall, displacement (–)',
      ],
      rows,
    ),
    list([
      'EC8: EN 1998-1:2004 §3.2.2.2, Eq. 3.6, η = √(10/(5 + ξ)) ≥ 0.55, ξ in percent.',
      'Newmark and Hall (1982), Earthquake Spectra and Design, EERI: median amplification factors, ratio at ζ to that at 5%.',
      'The record ratio is the geometric mean over the grid periods above 0 s; it varies with period (see the figure).',
    ]),
  ].join('\n');
}

export function rotdSection(spectra: RotDSpectra, tableNumber: number): string {
  const periods = spectra.periodsS;
  const selected = [0, 0.2, 0.5, 1, 2]
    .filter((t) => t >= periods[0] && t <= periods[periods.length - 1])
    .map((t) => nearest(periods, t));
  const rows = spectra.curves.flatMap((curve) =>
    selected.map((p): Cell[] => [
      dampingLabel(curve.damping),
      periods[p],
      curve.rotd50MS2[p] / g,
      curve.rotd100MS2[p] / g,
      curve.geomeanMS2[p] / g,
      curve.rotd50MS2[p] > 0 ? curve.rotd100MS2[p] / curve.rotd50MS2[p] : null,
    ]),
  );
  return [
    definitionTable('Components', [
      ['First component', `${spectra.records[0].name} (${spectra.records[0].source})`],
      ['Second component', `${spectra.records[1].name} (${spectra.records[1].source})`],
      ['Rotation angles', `0 ≤ θ < 180° in steps of ${spectra.angleStepDeg}°`],
      ['Zero padding of the shorter component', `${spectra.paddedSamples} samples`],
    ]),
    table(
      `Table ${tableNumber}. Two-component PSA at selected periods`,
      ['Damping ζ', 'T (s)', 'RotD50 (g)', 'RotD100 (g)', 'Geometric mean (g)', 'RotD100/RotD50 (–)'],
      rows,
    ),
    paragraph(
      'PSA(θ) = ω² max|u₁ cos θ + u₂ sin θ|; RotD50 is the median over the angles and RotD100 the largest (Boore 2010); the geometric mean is √(PSA₁·PSA₂) of the components as recorded.',
      'note',
    ),
  ].join('\n');
}

export function targetSection(t: TargetFit, tableNumber: number): string {
  return [
    definitionTable(`Table ${tableNumber}. Target and amplitude scaling`, [
      ['Target', t.description],
      ['Damping compared', `${formatNumber(t.damping * 100, 6)}%`],
      ['Scale factor', formatNumber(t.factor)],
      ['Fitted over', `${span(t.rangeS[0], t.rangeS[1])} (${t.periodCount} grid periods)`],
      [
        'Scaled record / target',
        `mean ${formatNumber(t.meanRatio)}, least ${formatNumber(t.minRatio)}, greatest ${formatNumber(t.maxRatio)}`,
      ],
      ['Criterion', t.criterion],
      [
        'Applied to the spectra of this report',
        t.applied ? 'yes: every spectral value above is scaled' : 'no: the values above are as recorded',
      ],
    ]),
    paragraph('The target is drawn on the PSA and four-way figures of section 4.', 'note'),
  ].join('\n');
}
