import { CAUTION } from '../base/caution.js';
import { formatNumber, formatRange, formatSignificant } from '../base/numbers.js';
import { gFromMS2, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { GroundMotionMeasures } from '../record/measures.js';
import { PROCESSING_ORDER } from '../record/process.js';
import type { GroundRecord } from '../record/record.js';
import type { PredominantPeriod } from '../spectrum/predominant.js';
import { terminalText } from './layout.js';

/** How each measure is computed, stated in the JSON and under the table. */
export const INFO_METHODS = {
  integration: 'velocity and displacement by the trapezoidal rule from rest (no baseline unless asked)',
  arias: 'Arias intensity I_a = π/(2g)∫a²dt (Arias 1970), trapezoidal rule',
  significant_duration:
    'D5–75 and D5–95 from the Husid curve (Trifunac and Brady 1975), linear between samples',
  bracketed_duration: 'first to last sample with |a| ≥ threshold (Bolt 1973)',
  cav: 'CAV = ∫|a|dt (EPRI 1988), no threshold screening',
  mean_period: 'T_m = Σ(C²/f)/ΣC² over FFT lines 0.25–20 Hz (Rathje, Abrahamson and Bray 1998)',
  predominant_period: 'period of the peak 5%-damped PSA, 200 log-spaced periods 0.02–10 s, Newmark-β average',
} as const;

/** The JSON contract of `quakesweep info` (keys and units are relied on by scripts). */
export function infoToJson(record: GroundRecord, m: GroundMotionMeasures, predominant: PredominantPeriod) {
  const g = STANDARD_GRAVITY_MS2;
  return {
    caution: CAUTION,
    record: {
      name: record.name,
      source: record.source,
      npts: record.accelMS2.length,
      dt_s: record.dtS,
      duration_s: (record.accelMS2.length - 1) * record.dtS,
      units_read: record.unitsRead,
    },
    processing: {
      order: PROCESSING_ORDER.join(' → '),
      steps: record.processing.map((step) => ({ ...step })),
    },
    pga_g: gFromMS2(m.pga.value),
    pga_time_s: m.pga.timeS,
    pgv_m_s: m.pgv.value,
    pgv_time_s: m.pgv.timeS,
    pgd_m: m.pgd.value,
    pgd_time_s: m.pgd.timeS,
    arias_m_s: m.ariasMS,
    d5_75_s: m.d5to75S,
    d5_95_s: m.d5to95S,
    t5_s: m.t5S,
    t75_s: m.t75S,
    t95_s: m.t95S,
    bracketed_duration_s: m.bracketedS,
    bracket_threshold_g: m.bracketThresholdMS2 / g,
    bracket_start_s: m.bracketStartS,
    bracket_end_s: m.bracketEndS,
    cav_m_s: m.cavMS,
    mean_period_s: m.meanPeriodS,
    mean_period_band_hz: m.meanPeriodBandHz,
    predominant_period_s: predominant.periodS,
    predominant_psa_g: predominant.psaMS2 / g,
    methods: INFO_METHODS,
  };
}

export type InfoJson = ReturnType<typeof infoToJson>;

/** A readable table for the terminal: the caution first, then one measure a line. */
export function infoTable(json: InfoJson): string {
  const r = json.record;
  const fourDigits = (value: number) => formatSignificant(value);
  const seconds = (value: number) => value.toFixed(2);
  const at = (t: number) => `at t = ${t.toFixed(3)} s`;
  const steps = json.processing.steps.map((step) => step.description);
  const bracket =
    json.bracket_start_s === null
      ? 'threshold never reached'
      : `${seconds(json.bracket_start_s)} to ${seconds(json.bracket_end_s ?? 0)} s`;
  const meanPeriod = json.mean_period_s === null ? '—' : fourDigits(json.mean_period_s);
  const band = formatRange(json.mean_period_band_hz[0], json.mean_period_band_hz[1], 'Hz');
  const predominantPsa = `PSA ${fourDigits(json.predominant_psa_g)} g at 5%`;
  const rows: [string, string, string, string][] = [
    ['PGA', fourDigits(json.pga_g), 'g', at(json.pga_time_s)],
    ['PGV', fourDigits(json.pgv_m_s), 'm/s', at(json.pgv_time_s)],
    ['PGD', fourDigits(json.pgd_m), 'm', at(json.pgd_time_s)],
    ['Arias intensity', fourDigits(json.arias_m_s), 'm/s', ''],
    ['D5–75', seconds(json.d5_75_s), 's', `${seconds(json.t5_s)} to ${seconds(json.t75_s)} s`],
    ['D5–95', seconds(json.d5_95_s), 's', `${seconds(json.t5_s)} to ${seconds(json.t95_s)} s`],
    [`bracketed (${json.bracket_threshold_g} g)`, seconds(json.bracketed_duration_s), 's', bracket],
    ['CAV', fourDigits(json.cav_m_s), 'm/s', ''],
    ['mean period T_m', meanPeriod, 's', band],
    ['predominant period', fourDigits(json.predominant_period_s), 's', predominantPsa],
  ];
  const width = Math.max(...rows.map((row) => row[0].length));
  return terminalText([
    `record  ${r.name} (${r.source}), ${r.npts} samples at ${formatNumber(r.dt_s, 6)} s, ${seconds(r.duration_s)} s long`,
    ...(steps.length === 0 ? ['nothing (as read)'] : steps).map((step) => `        processed: ${step}`),
    '',
    ...rows.map(([label, value, unit, note]) =>
      `${label.padEnd(width)}  ${value.padStart(10)} ${unit.padEnd(4)} ${note}`.trimEnd(),
    ),
    '',
    ...Object.entries(json.methods).map(([key, text]) => `${key.replace(/_/g, ' ')}: ${text}`),
  ]);
}
