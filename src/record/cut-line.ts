/**
 * A last line cut short: a file copied or written while it was read ends in the middle of a number
 * (`1.2345e-03` → `1.23`), which still reads as a number. When the lines before it print every
 * value in one fixed shape (decimals and exponent digits), a last line with no line break whose
 * last value is printed shorter than the values in its place before is taken as cut: common
 * practice for files written with a fixed format. Free formats (`0.5`, `0.25`) never agree over the
 * lines looked at, and shortest round-trip output has too many decimals, so neither is judged.
 */

/** Complete lines before the last that must agree on each value's shape. */
export const LINES_COMPARED = 8;

/**
 * Most decimals of a shape judged fixed: printf-style formats print up to about ten, while the
 * shortest round-trip form of a double (JavaScript's String, Python's repr) prints 15 to 17 and
 * sometimes fewer by chance, which must never look cut.
 */
const MAX_FIXED_DECIMALS = 12;

const SHAPE = /^[+-]?\d*(?:\.(\d*))?(?:[eEdD]([+-]?\d+))?$/;

interface Shape {
  decimals: number;
  exponentDigits: number; // -1: no exponent
}

function shapeOf(value: string): Shape | undefined {
  const m = SHAPE.exec(value);
  if (m === null || !/\d/.test(value)) return undefined;
  return {
    decimals: m[1]?.length ?? 0,
    exponentDigits: m[2] === undefined ? -1 : m[2].replace(/^[+-]/, '').length,
  };
}

function values(line: string): string[] {
  const hash = line.indexOf('#');
  const kept = hash === -1 ? line : line.slice(0, hash);
  return kept.split(/[\s,;]+/).filter((v) => v !== '');
}

/**
 * The last value of `last` when it looks cut short against `before` (the complete lines before it,
 * oldest first, at least LINES_COMPARED of them); undefined when nothing says so.
 */
export function cutValue(before: readonly string[], last: string): string | undefined {
  if (before.length < LINES_COMPARED) return undefined;
  const rows = before.slice(-LINES_COMPARED).map(values);
  const lastValues = values(last);
  const place = lastValues.length - 1;
  if (place < 0 || rows.some((row) => row.length <= place)) return undefined;
  const fixed = shapeOf(rows[0][place]);
  if (fixed === undefined || fixed.decimals > MAX_FIXED_DECIMALS) return undefined;
  for (const row of rows) {
    const shape = shapeOf(row[place]);
    if (
      shape === undefined ||
      shape.decimals !== fixed.decimals ||
      shape.exponentDigits !== fixed.exponentDigits
    )
      return undefined;
  }
  const shape = shapeOf(lastValues[place]);
  if (shape === undefined) return undefined; // not a number: the reader refuses it itself
  const shorter =
    shape.decimals < fixed.decimals ||
    (fixed.exponentDigits >= 0 && shape.exponentDigits < fixed.exponentDigits);
  return shorter ? lastValues[place] : undefined;
}

/**
 * Up to `count` complete lines of `text` that end before `end` (just past a line break), oldest
 * first; the text's first line only when `startsLine` (it did not begin in an earlier piece).
 */
export function linesBefore(text: string, end: number, count: number, startsLine = false): string[] {
  const lines: string[] = [];
  let stop = end;
  while (lines.length < count && stop > 0) {
    let lineEnd = stop - 1; // the break's last character
    if (text.charCodeAt(lineEnd) === 10 && lineEnd > 0 && text.charCodeAt(lineEnd - 1) === 13) lineEnd--;
    let start = lineEnd;
    while (start > 0) {
      const c = text.charCodeAt(start - 1);
      if (c === 10 || c === 13) break;
      start--;
    }
    if (start === 0 && !startsLine) break; // may have begun in an earlier piece of text: not taken
    const line = text.slice(start, lineEnd);
    if (line.trim() !== '') lines.unshift(line);
    stop = start;
  }
  return lines;
}
