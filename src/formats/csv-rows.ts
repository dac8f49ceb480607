import { cautionLines } from '../base/caution.js';
import { notFiniteError } from './finite.js';

/** A CSV cell: a number (refused unless finite), a word, or empty (null). */
export type CsvCell = number | string | null;

/**
 * CSV text of rows that are not by period: the caution and the `notes` on `#` lines (each on one
 * line), the header, then the rows. A word holding a comma or a quote is quoted (RFC 4180).
 */
export function csvRows(
  notes: readonly string[],
  header: readonly string[],
  rows: readonly CsvCell[][],
): string {
  const lines = [...cautionLines(), ...notes.map((note) => note.replace(/[\r\n]+/g, ' '))].map(
    (l) => `# ${l}`,
  );
  lines.push(header.join(','));
  for (const row of rows) {
    const cells = row.map((cell, i) => {
      if (cell === null) return '';
      if (typeof cell === 'number') {
        if (!Number.isFinite(cell)) throw notFiniteError(`${header[i]} = ${cell}`);
        return String(cell);
      }
      return /[",]/.test(cell) ? `"${cell.replace(/"/g, '""')}"` : cell;
    });
    lines.push(cells.join(','));
  }
  return `${lines.join('\n')}\n`;
}
