import { cautionLines, wrapText } from '../base/caution.js';
import { formatNumber, formatSignificant } from '../base/numbers.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { SpectrumRecordInfo } from '../spectrum/spectrum.js';
import { csvCell, csvNote } from './csv-cell.js';
import { notFiniteError } from './finite.js';
import { frequencyHz } from './frequency.js';

/** Percent label of a damping ratio, e.g. 0.05 → "5%". */
export function dampingLabel(damping: number): string {
  return `${formatNumber(damping * 100, 6)}%`;
}

/** A period as the tables write it: formatNumber's four significant figures, no trailing zeros. */
export function formatPeriod(t: number): string {
  return formatNumber(t);
}

/** `name (source), N samples at dt s`: the record as a terminal table opens with it. */
export const recordLine = (r: SpectrumRecordInfo) =>
  `record  ${r.name} (${r.source}), ${r.npts} samples at ${formatNumber(r.dtS, 6)} s`;

/** `PGA 0.38 g` of an acceleration in m/s². */
export const pgaText = (pgaMS2: number) => `PGA ${formatNumber(pgaMS2 / STANDARD_GRAVITY_MS2)} g`;

/**
 * A column by period: its CSV header and, when the terminal table shows it, its heading and width
 * (units in both); its value at the period of index p, null for an empty cell ("-" in a table),
 * which the table writes by `format` (4 significant digits unless given).
 */
export interface PeriodColumn {
  name: string;
  heading?: string;
  width?: number;
  at: (p: number) => number | null;
  format?: (value: number) => string;
}

/** A quantity of a curve, one column a damping: names as in PeriodColumn, to which `@5%` is added. */
export interface Quantity<Curve> extends Omit<PeriodColumn, 'at'> {
  at: (curve: Curve, p: number) => number | null;
}

/** The columns of every curve, each with its `quantities` in order. */
export function columnsByDamping<Curve extends { damping: number }>(
  curves: readonly Curve[],
  quantities: readonly Quantity<Curve>[],
): PeriodColumn[] {
  return curves.flatMap((curve) => {
    const d = dampingLabel(curve.damping);
    return quantities.map((q) => ({
      ...q,
      name: `${q.name}@${d}`,
      heading: q.heading && `${q.heading} @${d}`,
      at: (p: number) => q.at(curve, p),
    }));
  });
}

/**
 * CSV text: the caution and the `notes` on `#` lines (each kept on one line, as names from files
 * may hold line breaks), then the header and one row per period, the period and its frequency
 * f = 1/T first (empty at T = 0). A value that is not finite is refused (see finite.ts), naming its column.
 */
export function csvText(notes: readonly string[], periodsS: Float64Array, columns: readonly PeriodColumn[]) {
  const header = ['period_s', 'frequency_hz', ...columns.map((c) => c.name)];
  const oneLineNotes = notes.map(csvNote);
  const lines = [...cautionLines(), ...oneLineNotes].map((line) => `# ${line}`);
  lines.push(header.map(csvCell).join(','));
  for (let p = 0; p < periodsS.length; p++) {
    const cells = [periodsS[p], frequencyHz(periodsS[p]), ...columns.map((c) => c.at(p))];
    const bad = cells.findIndex((cell) => cell !== null && !Number.isFinite(cell));
    if (bad >= 0) throw notFiniteError(`${header[bad]} at ${periodsS[p]} s = ${cells[bad]}`);
    lines.push(cells.join(','));
  }
  return `${lines.join('\n')}\n`;
}

/** Terminal text: the caution on `!` lines, a blank line, then `lines`. */
export function terminalText(lines: readonly string[]): string {
  return `${[...cautionLines(92).map((line) => `! ${line}`), '', ...lines].join('\n')}\n`;
}

/** Cells right-aligned to their widths, one space apart. */
export function alignRight(cells: readonly string[], widths: readonly number[]): string {
  return cells.map((cell, i) => cell.padStart(widths[i])).join(' ');
}

/** The closing section of a terminal table: its method and assumptions, wrapped as a list. */
export function assumptionLines(assumptions: readonly string[]): string[] {
  const items = assumptions.flatMap((line) => wrapText(line, 92, '  - ', '    '));
  return ['', 'method and assumptions', ...items];
}

/** A terminal table by period of the columns that have a width: a heading row, then the summary rows. */
export function periodTable(periodsS: Float64Array, allColumns: readonly PeriodColumn[], toEnds = false) {
  const columns = allColumns.filter((c) => c.width !== undefined);
  const widths = [8, ...columns.map((c) => c.width!)];
  const lines = [alignRight(['T (s)', ...columns.map((c) => c.heading!)], widths)];
  for (const p of summaryRows(periodsS, toEnds)) {
    const cells = columns.map((c) => {
      const value = c.at(p);
      return value === null ? '-' : (c.format?.(value) ?? formatSignificant(value));
    });
    lines.push(alignRight([formatPeriod(periodsS[p]), ...cells], widths));
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
