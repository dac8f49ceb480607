import { usageError } from '../base/errors.js';
import { NUMBER } from './number.js';

/**
 * Fixed-width fields, as Fortran writes them: declared (`--fixed 8x10`, or widths `10,10,12`), or
 * found where values touch (`0.000E+00-1.145E-04`: a sign right after a digit or a point starts the
 * next value; after an exponent letter it is the exponent's).
 */

/** Most fields a declaration may list: more is no layout of a record. */
const MAX_FIELDS = 1000;

/** Parse `8x10` (count × width) or a list of widths `10,10,12` (also `3x10,12`) into widths. */
export function parseFixedWidths(text: string): number[] {
  const widths: number[] = [];
  for (const part of text.split(',')) {
    const m = /^\s*(?:(\d+)\s*[xX*]\s*)?(\d+)\s*$/.exec(part);
    const count = m === null ? Number.NaN : Number(m[1] ?? 1);
    const width = m === null ? Number.NaN : Number(m[2]);
    if (!(count >= 1 && width >= 1) || widths.length + count > MAX_FIELDS)
      throw usageError(
        `--fixed '${text}': give count x width (e.g. 8x10) or widths separated by commas (e.g. 10,10,12)`,
      );
    for (let i = 0; i < count; i++) widths.push(width);
  }
  return widths;
}

/**
 * The fields of a line cut at the declared widths, trimmed; the last width repeats when the line
 * is longer. Blank fields at the end (a short last line) are left out, a blank one inside is kept
 * (as '', which the reader refuses as an empty value).
 */
export function fixedFields(text: string, widths: readonly number[]): string[] {
  const line = text.trimEnd();
  const fields: string[] = [];
  let at = 0;
  for (let i = 0; at < line.length; i++) {
    const width = widths[Math.min(i, widths.length - 1)];
    fields.push(line.slice(at, at + width).trim());
    at += width;
  }
  while (fields.length > 0 && fields[fields.length - 1] === '') fields.pop();
  return fields;
}

/** Where a sign starts a new value: after a digit or a point, not after an exponent letter. */
const TOUCH = /(?<=[\d.])(?=[+-])/;

/** The values of a field where they touch (`0.000E+00-1.145E-04` → two), or null if it is not such a field. */
export function splitTouching(field: string): string[] | null {
  if (NUMBER.test(field)) return null;
  const parts = field.split(TOUCH);
  return parts.length > 1 && parts.every((p) => NUMBER.test(p)) ? parts : null;
}

/** Fields of whitespace-split text with touching values split apart; the same array when none touch. */
export function expandTouching(fields: string[]): string[] {
  let out: string[] | undefined;
  for (let i = 0; i < fields.length; i++) {
    const parts = fields[i] === '' ? null : splitTouching(fields[i]);
    if (parts !== null) out ??= fields.slice(0, i);
    if (out !== undefined) out.push(...(parts ?? [fields[i]]));
  }
  return out ?? fields;
}

/**
 * The common width of right-aligned fields on a line (each value ending at a multiple of it, as
 * Fortran's E and F formats write), or undefined when the values are not so aligned.
 */
export function fieldWidth(text: string): number | undefined {
  const ends: number[] = [];
  for (const m of text.matchAll(/\S+/g)) {
    let at = m.index;
    for (const part of splitTouching(m[0]) ?? [m[0]]) {
      at += part.length;
      ends.push(at);
    }
  }
  const width = ends[0];
  if (ends.length < 2 || width === undefined) return undefined;
  return ends.every((end, i) => end === (i + 1) * width) ? width : undefined;
}
