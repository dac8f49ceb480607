import { cautionLines } from '../base/caution.js';
import { LENGTH_UNITS, type LengthUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { METHOD_DESCRIPTIONS } from '../oscillator/recurrence.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import type { TargetFit } from '../spectrum/target.js';
import { dampingLabel } from './spectrum-csv.js';
import { targetTableLines } from './target.js';

/** A short table for the terminal: the caution first, then peaks at a few periods. */
export function summaryTable(spectrum: Spectrum, lengthUnit: LengthUnit, target?: TargetFit): string {
  const out: string[] = [];
  for (const line of cautionLines(92)) out.push(`! ${line}`);
  out.push('');
  const r = spectrum.record;
  out.push(
    `record  ${r.name} (${r.source}), ${r.npts} samples at ${r.dtS} s, PGA ${(r.pgaMS2 / STANDARD_GRAVITY_MS2).toFixed(4)} g`,
  );
  for (const step of r.processing) out.push(`        processed: ${step.description}`);
  out.push(`method  ${METHOD_DESCRIPTIONS[spectrum.method]}`);
  out.push('');
  const perLength = 1 / LENGTH_UNITS[lengthUnit];
  const columns = spectrum.curves.flatMap((curve): PeriodColumn[] => {
    const d = dampingLabel(curve.damping);
    return [
      { heading: `SD ${lengthUnit} @${d}`, width: 14, at: (p) => curve.sdM[p] * perLength },
      { heading: `PSA g @${d}`, width: 12, at: (p) => curve.psaMS2[p] / STANDARD_GRAVITY_MS2 },
    ];
  });
  out.push(...periodTable(spectrum.periodsS, columns));
  out.push('');
  for (const curve of spectrum.curves) {
    let peak = 0;
    for (let p = 1; p < curve.psaMS2.length; p++) if (curve.psaMS2[p] > curve.psaMS2[peak]) peak = p;
    out.push(
      `peak PSA at ${dampingLabel(curve.damping)}: ${(curve.psaMS2[peak] / STANDARD_GRAVITY_MS2).toPrecision(4)} g at T = ${formatPeriod(spectrum.periodsS[peak])} s`,
    );
  }
  out.push(`(${spectrum.periodsS.length} periods; --format json or csv for all of them)`);
  if (target !== undefined) out.push('', ...targetTableLines(target));
  return `${out.join('\n')}\n`;
}

/**
 * A column of a period table: its heading, its width and its value at the period of index p,
 * written by `format` (4 significant digits unless given).
 */
export interface PeriodColumn {
  heading: string;
  width: number;
  at: (p: number) => number;
  format?: (value: number) => string;
}

/**
 * The lines of a terminal table by period: a heading row, then the summary rows (summaryRows).
 */
export function periodTable(periodsS: Float64Array, columns: PeriodColumn[], toEnds = false): string[] {
  const lines = [['T (s)'.padStart(8), ...columns.map((c) => c.heading.padStart(c.width))].join(' ')];
  for (const p of summaryRows(periodsS, toEnds)) {
    const row = [formatPeriod(periodsS[p]).padStart(8)];
    for (const c of columns) {
      const value = c.at(p);
      row.push((c.format === undefined ? value.toPrecision(4) : c.format(value)).padStart(c.width));
    }
    lines.push(row.join(' '));
  }
  return lines;
}

/**
 * Indices of the grid nearest to a set of round periods, for the summary; round periods outside
 * the grid are skipped, or with `toEnds` give the grid's nearest end (the floor table).
 */
export function summaryRows(periodsS: Float64Array, toEnds = false): number[] {
  if (periodsS.length <= 16) return Array.from(periodsS, (_, i) => i);
  const targets = [0, 0.02, 0.05, 0.1, 0.2, 0.3, 0.5, 0.75, 1, 1.5, 2, 3, 5, 10];
  const rows = new Set<number>();
  for (const target of targets) {
    if (!toEnds && (target < periodsS[0] || target > periodsS[periodsS.length - 1])) continue;
    let best = 0;
    for (let i = 1; i < periodsS.length; i++) {
      if (Math.abs(periodsS[i] - target) < Math.abs(periodsS[best] - target)) best = i;
    }
    rows.add(best);
  }
  return [...rows].sort((a, b) => a - b);
}

function formatPeriod(t: number): string {
  return t === 0 ? '0' : Number(t.toPrecision(3)).toString();
}
