import { parseNumber, printedResolution } from './number.js';

/** A row of values held until the layout is chosen. */
export interface HeldRow {
  fields: string[];
  line: number;
}

/** Rows looked at before an `auto` file of several values a line is called a table or wrapped. */
export const ROWS_TO_CHOOSE = 3;

/**
 * Whether the first column of the held rows reads as time: every row as wide as the first, the
 * first field rising by one step (to its last printed digit, as the reader's time check allows).
 * Otherwise the values are wrapped several to a line (a wrapped file starts with values near zero,
 * which do not rise by a uniform step).
 */
export function firstColumnIsTime(rows: readonly HeldRow[]): boolean {
  const width = rows[0].fields.length;
  if (rows.some((r) => r.fields.length !== width)) return false;
  const times = rows.map((r) => parseNumber(r.fields[0]));
  if (rows.length < 2) return true;
  const stepS = times[1] - times[0];
  if (!(stepS > 0)) return false;
  for (let i = 2; i < times.length; i++) {
    const off = Math.abs(times[i] - times[i - 1] - stepS);
    if (off > Math.min(printedResolution(rows[i].fields[0]) * 1.01, 0.5 * stepS) + 1e-6 * stepS) return false;
  }
  return true;
}

/** What the reader saw of the layout, for the hints of its errors. */
export interface LayoutSeen {
  /** The first line of values and how many it has. */
  firstLine: number;
  perLine: number;
  /** The common width of its fields, when they are right-aligned in one width. */
  width?: number;
}

/** "8 values a line in fields of 13 after 4 header lines". */
export function layoutWords(seen: LayoutSeen): string {
  const fields = seen.width === undefined ? '' : ` in fields of ${seen.width}`;
  const header = seen.firstLine - 1;
  const after = header === 0 ? '' : ` after ${header} header ${header === 1 ? 'line' : 'lines'}`;
  return `${seen.perLine} ${seen.perLine === 1 ? 'value' : 'values'} a line${fields}${after}`;
}

/** The options that would read values wrapped several a line with no time column. */
export function wrappedHint(seen: LayoutSeen): string {
  return `looks like ${layoutWords(seen)} with no time column; try --layout wrapped --dt STEP (or state the step in the header, e.g. 'dt = 0.01 s')`;
}

/** A line whose count of values differs from the first line's: that line may be the header's. */
export function countHint(seen: LayoutSeen, found: number): string {
  const lines = seen.firstLine === 1 ? 'line 1 is' : `lines 1 to ${seen.firstLine} are`;
  return `line ${seen.firstLine} has ${seen.perLine} values and this line ${found}; if ${lines} part of the header, try --skip ${seen.firstLine}`;
}

/** Values that touch with no sign between them: only declared widths can cut them apart. */
export function fixedHint(seen: LayoutSeen): string {
  return seen.width === undefined
    ? 'if the values are fixed-width fields that touch, declare their widths with --fixed COUNTxWIDTH'
    : `looks like ${layoutWords(seen)}; try --fixed ${seen.perLine}x${seen.width}`;
}
