import { cautionLines } from '../base/caution.js';
import { LENGTH_UNITS, type LengthUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import type { TargetFit } from '../spectrum/target.js';
import { assertFiniteResult } from './finite.js';
import { targetCsvNotes } from './target.js';

export interface CsvOptions {
  /** Unit for SD, PSV and SV (PSV and SV in that unit per second). Default m. */
  lengthUnit?: LengthUnit;
  /** A fitted target: its notes, and its PSA in a last column (empty where it does not reach). */
  target?: TargetFit;
}

/** Percent label of a damping ratio, e.g. 0.05 → "5%". */
export function dampingLabel(damping: number): string {
  return `${Number((damping * 100).toPrecision(6))}%`;
}

/**
 * One row per period; a column per quantity and damping with its unit in the header; the caution,
 * record and method on leading `#` lines.
 */
export function spectrumToCsv(spectrum: Spectrum, options: CsvOptions = {}): string {
  const unit = options.lengthUnit ?? 'm';
  assertFiniteResult([
    spectrum.periodsS,
    ...spectrum.curves.map((c) => [c.sdM, c.psvMS, c.psaMS2, c.svMS, c.saMS2]),
  ]);
  const perLength = 1 / LENGTH_UNITS[unit];
  const lines = cautionLines().map((line) => `# ${line}`);
  lines.push(
    `# record: ${oneLine(spectrum.record.name)}; npts ${spectrum.record.npts}; dt ${spectrum.record.dtS} s`,
  );
  lines.push(`# method: ${spectrum.method}`);
  for (const step of spectrum.record.processing) lines.push(`# processing: ${oneLine(step.description)}`);
  const target = options.target;
  if (target !== undefined) lines.push(...targetCsvNotes(target));
  const header = ['period_s'];
  for (const curve of spectrum.curves) {
    const d = dampingLabel(curve.damping);
    header.push(`sd_${unit}@${d}`, `psv_${unit}_s@${d}`, `psa_g@${d}`, `sv_${unit}_s@${d}`, `sa_g@${d}`);
  }
  if (target !== undefined) header.push('target_psa_g');
  lines.push(header.join(','));
  for (let p = 0; p < spectrum.periodsS.length; p++) {
    const row = [String(spectrum.periodsS[p])];
    for (const curve of spectrum.curves) {
      row.push(
        String(curve.sdM[p] * perLength),
        String(curve.psvMS[p] * perLength),
        String(curve.psaMS2[p] / STANDARD_GRAVITY_MS2),
        String(curve.svMS[p] * perLength),
        String(curve.saMS2[p] / STANDARD_GRAVITY_MS2),
      );
    }
    if (target !== undefined) row.push(target.psaG[p] === null ? '' : String(target.psaG[p]));
    lines.push(row.join(','));
  }
  return `${lines.join('\n')}\n`;
}

function oneLine(text: string): string {
  return text.replace(/[\r\n]+/g, ' ');
}
