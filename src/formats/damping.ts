import { CAUTION } from '../base/caution.js';
import { formatNumber } from '../base/numbers.js';
import { STANDARD_GRAVITY_MS2 as G } from '../base/units.js';
import { METHOD_DESCRIPTIONS } from '../oscillator/recurrence.js';
import type { DampingComparison, DampingCurveComparison } from '../spectrum/damping.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import { frequenciesHz } from './frequency.js';
import {
  alignRight,
  columnsByDamping,
  csvText,
  dampingLabel,
  periodTable,
  type Quantity,
  recordLine,
  terminalText,
} from './layout.js';
import { recordToJson, toG } from './spectrum-json.js';

const SOURCES = {
  ec8_eta: 'EN 1998-1:2004 §3.2.2.2, Eq. 3.6: η = √(10/(5 + ξ)) ≥ 0.55, ξ in percent; ratio η(ξ)/η(5%)',
  newmark_hall_1982:
    'Newmark and Hall (1982), Earthquake Spectra and Design, EERI: median amplification factors 3.21 − 0.68 ln ξ (acceleration), 2.31 − 0.41 ln ξ (velocity), 1.82 − 0.27 ln ξ (displacement), ξ in percent; ratio at ξ to at 5%',
};

const nullable = (value: number | null) => (value === null || Number.isNaN(value) ? null : value);

/** A ratio as the tables write it, "-" where it is not defined. */
const ratioText = (value: number | null) => (value === null || Number.isNaN(value) ? '-' : value.toFixed(3));

type Curve = DampingCurveComparison;
const psa: Quantity<Curve> = { name: 'psa_g', heading: 'PSA g', width: 13, at: (c, p) => c.psaMS2[p] / G };
const ratio: Quantity<Curve> = {
  name: 'ratio',
  heading: 'ratio',
  width: 12,
  at: (c, p) => nullable(c.ratio[p]),
  format: ratioText,
};

export function dampingToJson(spectrum: Spectrum, comparison: DampingComparison, added: boolean) {
  return {
    caution: CAUTION,
    record: recordToJson(spectrum.record),
    method: spectrum.method,
    method_description: METHOD_DESCRIPTIONS[spectrum.method],
    reference_damping: comparison.referenceDamping,
    reference_added: added,
    published_sources: SOURCES,
    periods_s: Array.from(comparison.periodsS),
    frequencies_hz: frequenciesHz(comparison.periodsS),
    spectra: comparison.curves.map((curve) => ({
      damping: curve.damping,
      psa_g: toG(curve.psaMS2, comparison.periodsS),
      ratio_to_reference: Array.from(curve.ratio, nullable),
      geometric_mean_ratio: nullable(curve.geometricMeanRatio),
      published: {
        ec8_eta_ratio: curve.published.ec8Eta,
        newmark_hall_1982_ratio: curve.published.newmarkHall,
      },
    })),
  };
}

/** A published ratio on a `#` line: four significant figures, empty where there is none. */
const note = (value: number | null | undefined) =>
  value === null || value === undefined ? '' : formatNumber(value);

/** Every PSA, then every ratio, one column a damping; the published ratios on `#` lines. */
export function dampingToCsv(spectrum: Spectrum, comparison: DampingComparison): string {
  const notes = [
    `record: ${spectrum.record.name}; method: ${spectrum.method}`,
    ...spectrum.record.processing.map((step) => `processing: ${step.description}`),
    `reference damping: ${dampingLabel(comparison.referenceDamping)}`,
    ...comparison.curves.map(({ damping, published }) => {
      const nh = published.newmarkHall;
      return `published ratio at ${dampingLabel(damping)}: EC8 eta ${note(published.ec8Eta)}; Newmark-Hall acceleration ${note(nh.acceleration)} velocity ${note(nh.velocity)} displacement ${note(nh.displacement)}`;
    }),
  ];
  const { curves } = comparison;
  return csvText(notes, comparison.periodsS, [
    ...columnsByDamping(curves, [psa]),
    ...columnsByDamping(curves, [ratio]),
  ]);
}

export function dampingTable(spectrum: Spectrum, comparison: DampingComparison, added: boolean): string {
  const widths = [7, 8, 8, 8, 8, 8];
  const out = [
    recordLine(spectrum.record),
    ...spectrum.record.processing.map((step) => `        processed: ${step.description}`),
    `method  ${METHOD_DESCRIPTIONS[spectrum.method]}`,
    `ratios  PSA(ξ)/PSA(5%)${added ? ' (5% added as the reference)' : ''}`,
    '',
    alignRight(['ξ', 'record', 'EC8 η', 'NH acc', 'NH vel', 'NH disp'], widths),
  ];
  for (const curve of comparison.curves) {
    const { ec8Eta, newmarkHall: nh } = curve.published;
    const ratios = [curve.geometricMeanRatio, ec8Eta, nh.acceleration, nh.velocity, nh.displacement];
    out.push(alignRight([dampingLabel(curve.damping), ...ratios.map(ratioText)], widths));
  }
  out.push('(record: geometric mean of the ratio over the periods above 0 s)', '');
  out.push(...periodTable(comparison.periodsS, columnsByDamping(comparison.curves, [psa, ratio])));
  out.push(`(${comparison.periodsS.length} periods; --format json or csv for all of them)`);
  return terminalText(out);
}
