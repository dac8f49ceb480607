import { formatNumber } from '../base/numbers.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { appliedSteps, stepText } from '../record/reading.js';
import type { SpectrumRecordInfo } from '../spectrum/spectrum.js';

/** Rough width of running text: 0.5 em a character, a little over the average of common sans-serif faces. */
function proseWidthPx(text: string, fontSizePx: number): number {
  return text.length * fontSizePx * 0.5;
}

/** Break `text` into lines that fit `widthPx` at `fontSizePx`, at spaces; a longer word stands alone. */
export function wrapText(text: string, widthPx: number, fontSizePx: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter((w) => w.length > 0)) {
    const candidate = line.length > 0 ? `${line} ${word}` : word;
    if (line.length > 0 && proseWidthPx(candidate, fontSizePx) > widthPx) {
      lines.push(line);
      line = word;
    } else {
      line = candidate;
    }
  }
  if (line.length > 0) lines.push(line);
  return lines;
}

/** A damping ratio as a percentage, e.g. 0.05 → "5%". */
export function percentLabel(damping: number): string {
  return `${formatNumber(damping * 100, 6)}%`;
}

/** A peak value for a label: formatNumber's four significant figures, with a true minus sign. */
export function formatValue(value: number): string {
  return formatNumber(value).replace('-', '−');
}

/** The subtitle line that names a record: its name and file, samples, step and PGA. */
export function recordLine(label: string, r: SpectrumRecordInfo): string {
  return `${label}: ${r.name} (${r.source}); ${r.npts} samples at Δt = ${formatNumber(r.dtS, 6)} s; PGA = ${formatValue(r.pgaMS2 / STANDARD_GRAVITY_MS2)} g`;
}

/** The subtitle line that states the method and the damping ratios drawn. */
export function methodLine(method: string, curves: readonly { damping: number }[], what = 'damping'): string {
  return `Method: ${method}; ${what} ζ = ${curves.map((c) => percentLabel(c.damping)).join(', ')}`;
}

/**
 * The note that T = 0, when `periodsS` holds it, is left off a logarithmic period axis, or a
 * frequency axis (f = 1/T is infinite there), with its value there (`there` is given the index of
 * T = 0); none when the grid does not hold it.
 */
export function zeroPeriodNotes(
  periodsS: ArrayLike<number>,
  there: string | ((zero: number) => string),
  axis: 'period' | 'frequency' = 'period',
): string[] {
  const zero = Array.from(periodsS).indexOf(0);
  if (zero < 0) return [];
  const value = typeof there === 'string' ? there : there(zero);
  if (axis === 'frequency')
    return [
      `T = 0 s (f = ∞) is in the period grid but cannot be drawn on a frequency axis; it is left off${value}.`,
    ];
  return [`T = 0 s is in the period grid but cannot be drawn on a logarithmic axis; it is left off${value}.`];
}

/**
 * One subtitle line per processing step: "Read: …" for how the record was read, "Warning: …" for a
 * warning, "Processed: …" for each step applied; `none` (if given) when no step was applied.
 */
export function processingLines(
  processing: readonly { operation?: string; description: string }[] = [],
  none?: string,
): string[] {
  const lines = processing.map((step) => {
    const label = step.operation === 'read' ? 'Read' : step.operation === 'warning' ? 'Warning' : 'Processed';
    return `${label}: ${stepText(step)}`;
  });
  if (appliedSteps(processing).length === 0 && none !== undefined) lines.push(none);
  return lines;
}

/** "Record: name (source)", the source left out when it is missing or the same as the name. */
export function recordNameLine(name: string, source: string | undefined): string {
  return `Record: ${name}${source !== undefined && source !== name ? ` (${source})` : ''}`;
}
