/**
 * CSV cells that a spreadsheet opens as text, never as a formula (formula injection): a text cell
 * that begins with `=`, `+`, `-`, `@`, a tab or a carriage return gets a leading apostrophe, which
 * spreadsheets take as "text follows" (common practice); a cell that is a plain number (`-0.25`,
 * `+3e-2`) is left as it is, so numbers stay numbers. Then a cell holding a comma, a quote or a
 * line break is quoted (RFC 4180).
 */
import { markupSafe } from '../base/printable.js';

const FORMULA_START = /^[=+\-@\t\r]/;
const PLAIN_NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

export function csvCell(cell: string): string {
  // A name from a file may hold terminal escapes or control characters: removed (see printable).
  const text = markupSafe(cell);
  const safe = FORMULA_START.test(text) && !PLAIN_NUMBER.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/**
 * A `#` note line's text, kept on one line (names from files may hold line breaks), with every
 * piece between commas neutralised as csvCell does (after any blanks and quotes a spreadsheet
 * would drop), since a spreadsheet splits the note at its commas too.
 */
export function csvNote(note: string): string {
  return markupSafe(note)
    .replace(/[\r\n]+/g, ' ')
    .split(',')
    .map((piece, i) => {
      if (i === 0) return piece;
      const start = /^[\s"]*/.exec(piece)?.[0] ?? '';
      const rest = piece.slice(start.length);
      return FORMULA_START.test(rest) && !PLAIN_NUMBER.test(rest.trim().replace(/"$/, ''))
        ? `'${piece}`
        : piece;
    })
    .join(',');
}
