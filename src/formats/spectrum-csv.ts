import { formatNumber } from '../base/numbers.js';
import { LENGTH_UNITS, type LengthUnit } from '../base/units.js';
import type { Spectrum, SpectrumCurve } from '../spectrum/spectrum.js';
import type { TargetFit } from '../spectrum/target.js';
import { columnsByDamping, csvText } from './layout.js';
import { spectralG } from './spectrum-json.js';
import { targetCsvNotes } from './target.js';

export interface CsvOptions {
  /** Unit for SD, PSV and SV (PSV and SV in that unit per second). Default m. */
  lengthUnit?: LengthUnit;
  /** A fitted target: its notes, and its PSA in a last column (empty where it does not reach). */
  target?: TargetFit;
}

/** The columns of a spectrum, SD, PSV, PSA, SV and SA per damping; the terminal table shows SD and PSA. */
export function spectrumColumns(spectrum: Spectrum, unit: LengthUnit) {
  const perLength = 1 / LENGTH_UNITS[unit];
  return columnsByDamping<SpectrumCurve>(spectrum.curves, [
    { name: `sd_${unit}`, heading: `SD ${unit}`, width: 14, at: (c, p) => c.sdM[p] * perLength },
    { name: `psv_${unit}_s`, at: (c, p) => c.psvMS[p] * perLength },
    {
      name: 'psa_g',
      heading: 'PSA g',
      width: 12,
      at: (c, p) => spectralG(c.psaMS2[p], spectrum.periodsS[p]),
    },
    { name: `sv_${unit}_s`, at: (c, p) => c.svMS[p] * perLength },
    { name: 'sa_g', at: (c, p) => spectralG(c.saMS2[p], spectrum.periodsS[p]) },
  ]);
}

/**
 * One row per period; a column per quantity and damping with its unit in the header; the caution,
 * record and method on leading `#` lines.
 */
export function spectrumToCsv(spectrum: Spectrum, options: CsvOptions = {}): string {
  const { record } = spectrum;
  const target = options.target;
  const notes = [
    `record: ${record.name}; npts ${record.npts}; dt ${formatNumber(record.dtS, 6)} s`,
    `method: ${spectrum.method}`,
    ...record.processing.map((step) => `processing: ${step.description}`),
    ...(target === undefined ? [] : targetCsvNotes(target)),
  ];
  const columns = spectrumColumns(spectrum, options.lengthUnit ?? 'm');
  if (target !== undefined) columns.push({ name: 'target_psa_g', at: (p) => target.psaG[p] });
  return csvText(notes, spectrum.periodsS, columns);
}
