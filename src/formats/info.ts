import { CAUTION, cautionLines } from '../base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { GroundMotionMeasures } from '../record/measures.js';
import { PROCESSING_ORDER } from '../record/process.js';
import type { GroundRecord } from '../record/record.js';
import type { PredominantPeriod } from '../spectrum/predominant.js';

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
    pga_g: m.pga.value / g,
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
  const out: string[] = [];
  for (const line of cautionLines(92)) out.push(`! ${line}`);
  out.push('');
  const r = json.record;
  out.push(
    `record  ${r.name} (${r.source}), ${r.npts} samples at ${r.dt_s} s, ${fixed(r.duration_s, 2)} s long`,
  );
  if (json.processing.steps.length === 0) out.push('        processed: nothing (as read)');
  for (const step of json.processing.steps) out.push(`        processed: ${step.description}`);
  out.push('');
  const at = (t: number) => `at t = ${fixed(t, 3)} s`;
  const rows: [string, string, string, string][] = [
    ['PGA', sig(json.pga_g), 'g', at(json.pga_time_s)],
    ['PGV', sig(json.pgv_m_s), 'm/s', at(json.pgv_time_s)],
    ['PGD', sig(json.pgd_m), 'm', at(json.pgd_time_s)],
    ['Arias intensity', sig(json.arias_m_s), 'm/s', ''],
    ['D5–75', fixed(json.d5_75_s, 2), 's', `${fixed(json.t5_s, 2)} to ${fixed(json.t75_s, 2)} s`],
    ['D5–95', fixed(json.d5_95_s, 2), 's', `${fixed(json.t5_s, 2)} to ${fixed(json.t95_s, 2)} s`],
    [
      `bracketed (${json.bracket_threshold_g} g)`,
      fixed(json.bracketed_duration_s, 2),
      's',
      json.bracket_start_s === null
        ? 'threshold never reached'
        : `${fixed(json.bracket_start_s, 2)} to ${fixed(json.bracket_end_s ?? 0, 2)} s`,
    ],
    ['CAV', sig(json.cav_m_s), 'm/s', ''],
    [
      'mean period T_m',
      json.mean_period_s === null ? '—' : sig(json.mean_period_s),
      's',
      `${json.mean_period_band_hz[0]}–${sig(json.mean_period_band_hz[1])} Hz`,
    ],
    ['predominant period', sig(json.predominant_period_s), 's', `PSA ${sig(json.predominant_psa_g)} g at 5%`],
  ];
  const width = Math.max(...rows.map((row) => row[0].length));
  for (const [label, value, unit, note] of rows) {
    out.push(`${label.padEnd(width)}  ${value.padStart(10)} ${unit.padEnd(4)} ${note}`.trimEnd());
  }
  out.push('');
  for (const [key, text] of Object.entries(json.methods)) out.push(`${key.replace(/_/g, ' ')}: ${text}`);
  return `${out.join('\n')}\n`;
}

function sig(value: number): string {
  return value.toPrecision(4);
}

function fixed(value: number, digits: number): string {
  return value.toFixed(digits);
}
