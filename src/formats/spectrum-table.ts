import { formatNumber } from '../base/numbers.js';
import { type LengthUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { METHOD_DESCRIPTIONS } from '../oscillator/recurrence.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import type { TargetFit } from '../spectrum/target.js';
import { dampingLabel, formatPeriod, periodTable, pgaText, recordLine, terminalText } from './layout.js';
import { spectrumColumns } from './spectrum-csv.js';
import { targetTableLines } from './target.js';

/** A short table for the terminal: the caution first, then peaks at a few periods. */
export function summaryTable(spectrum: Spectrum, lengthUnit: LengthUnit, target?: TargetFit): string {
  const r = spectrum.record;
  const out = [
    `${recordLine(r)}, ${pgaText(r.pgaMS2)}`,
    ...r.processing.map((step) => `        processed: ${step.description}`),
    `method  ${METHOD_DESCRIPTIONS[spectrum.method]}`,
    '',
  ];
  out.push(...periodTable(spectrum.periodsS, spectrumColumns(spectrum, lengthUnit)), '');
  for (const curve of spectrum.curves) {
    let peak = 0;
    for (let p = 1; p < curve.psaMS2.length; p++) if (curve.psaMS2[p] > curve.psaMS2[peak]) peak = p;
    out.push(
      `peak PSA at ${dampingLabel(curve.damping)}: ${formatNumber(curve.psaMS2[peak] / STANDARD_GRAVITY_MS2)} g at T = ${formatPeriod(spectrum.periodsS[peak])} s`,
    );
  }
  out.push(`(${spectrum.periodsS.length} periods; --format json or csv for all of them)`);
  if (target !== undefined) out.push('', ...targetTableLines(target));
  return terminalText(out);
}
