import { formatNumber, formatRange } from '../base/numbers.js';
import { type CsvCell, csvRows } from './csv-rows.js';
import type { InfoJson } from './info.js';

/** The measures of info.ts's JSON, one a row, and the unit each JSON key carries. */
const MEASURES: [keyof InfoJson, string][] = [
  ['pga_g', 'g'],
  ['pga_time_s', 's'],
  ['pgv_m_s', 'm/s'],
  ['pgv_time_s', 's'],
  ['pgd_m', 'm'],
  ['pgd_time_s', 's'],
  ['arias_m_s', 'm/s'],
  ['d5_75_s', 's'],
  ['d5_95_s', 's'],
  ['t5_s', 's'],
  ['t75_s', 's'],
  ['t95_s', 's'],
  ['bracketed_duration_s', 's'],
  ['bracket_threshold_g', 'g'],
  ['bracket_start_s', 's'],
  ['bracket_end_s', 's'],
  ['cav_m_s', 'm/s'],
  ['mean_period_s', 's'],
  ['predominant_period_s', 's'],
  ['predominant_psa_g', 'g'],
];

/**
 * `quakesweep info --format csv`: one measure a row (its JSON key, value, unit; empty where the
 * JSON holds null), the record, its processing and each measure's method on `#` lines.
 */
export function infoToCsv(json: InfoJson): string {
  const r = json.record;
  const notes = [
    `record: ${r.name}; source ${r.source}; npts ${r.npts}; dt ${formatNumber(r.dt_s, 6)} s; units read ${r.units_read}`,
    ...json.processing.steps.map((step) => `processing: ${step.description}`),
    `mean period band: ${formatRange(json.mean_period_band_hz[0], json.mean_period_band_hz[1], 'Hz')}`,
    ...Object.entries(json.methods).map(([key, text]) => `method ${key}: ${text}`),
  ];
  const rows = MEASURES.map(([key, unit]): CsvCell[] => [key, json[key] as number | null, unit]);
  return csvRows(notes, ['measure', 'value', 'unit'], rows);
}
