import { CAUTION } from '../base/caution.js';
import { formatNumber } from '../base/numbers.js';
import { STANDARD_GRAVITY_MS2 as G } from '../base/units.js';
import { METHOD_DESCRIPTIONS } from '../oscillator/recurrence.js';
import type { RotDCurve, RotDSpectra } from '../spectrum/rotd.js';
import { frequenciesHz } from './frequency.js';
import { columnsByDamping, csvText, periodTable, pgaText, recordLine, terminalText } from './layout.js';
import { recordToJson, toG } from './spectrum-json.js';

const notes = (spectra: RotDSpectra) => [
  `PSA(θ) = ω² max|u₁ cos θ + u₂ sin θ| over ${180 / spectra.angleStepDeg} angles 0 ≤ θ < 180° in steps of ${spectra.angleStepDeg}°; RotD50 is the median over angles, RotD100 the largest (Boore 2010); geometric mean √(PSA₁ PSA₂) of the components as recorded`,
  ...(spectra.paddedSamples > 0
    ? [`the shorter component was padded with ${spectra.paddedSamples} zero samples (ground at rest)`]
    : []),
];

/** RotD50, RotD100 and the geometric mean per damping, in g, for the CSV and the terminal table alike. */
function columns(spectra: RotDSpectra) {
  return columnsByDamping<RotDCurve>(spectra.curves, [
    { name: 'rotd50_g', heading: 'RotD50 g', width: 15, at: (c, p) => c.rotd50MS2[p] / G },
    { name: 'rotd100_g', heading: 'RotD100 g', width: 16, at: (c, p) => c.rotd100MS2[p] / G },
    { name: 'geomean_g', heading: 'geomean g', width: 16, at: (c, p) => c.geomeanMS2[p] / G },
  ]);
}

export function rotdToJson(spectra: RotDSpectra) {
  return {
    caution: CAUTION,
    records: spectra.records.map(recordToJson),
    method: spectra.method,
    method_description: METHOD_DESCRIPTIONS[spectra.method],
    angle_step_deg: spectra.angleStepDeg,
    padded_samples: spectra.paddedSamples,
    notes: notes(spectra),
    periods_s: Array.from(spectra.periodsS),
    frequencies_hz: frequenciesHz(spectra.periodsS),
    spectra: spectra.curves.map((curve) => ({
      damping: curve.damping,
      rotd50_g: toG(curve.rotd50MS2),
      rotd100_g: toG(curve.rotd100MS2),
      geomean_g: toG(curve.geomeanMS2),
    })),
  };
}

export function rotdToCsv(spectra: RotDSpectra): string {
  const header = [
    ...spectra.records.flatMap((r) => [
      `record: ${r.name}; npts ${r.npts}; dt ${formatNumber(r.dtS, 6)} s`,
      ...r.processing.map((step) => `processing of ${r.name}: ${step.description}`),
    ]),
    `method: ${spectra.method}`,
    ...notes(spectra),
  ];
  return csvText(header, spectra.periodsS, columns(spectra));
}

export function rotdTable(spectra: RotDSpectra): string {
  return terminalText([
    ...spectra.records.flatMap((r) => [
      `${recordLine(r)}, ${pgaText(r.pgaMS2)}`,
      ...r.processing.map((step) => `        processed: ${step.description}`),
    ]),
    `method  ${METHOD_DESCRIPTIONS[spectra.method]}`,
    ...notes(spectra).map((note) => `note    ${note}`),
    '',
    ...periodTable(spectra.periodsS, columns(spectra)),
    `(${spectra.periodsS.length} periods; --format json or csv for all of them)`,
  ]);
}
