import { cautionLines } from '../base/caution.js';
import { csvCell, csvNote } from './csv-cell.js';
import { notFiniteError } from './finite.js';

/** A CSV cell: a number (refused unless finite), a word, or empty (null). */
export type CsvCell = number | string | null;

/**
 * CSV text of rows that are not by period: the caution and the `notes` on `#` lines (each on one
 * line), the header, then the rows. Words and header cells go through csvCell (no formula, quoted
 * when they hold a comma or a quote).
 */
export function csvRows(
  notes: readonly string[],
  header: readonly string[],
  rows: readonly CsvCell[][],
): string {
  const lines = [...cautionLines(), ...notes.map(csvNote)].map((l) => `# ${l}`);
  lines.push(header.map(csvCell).join(','));
  for (const row of rows) {
    const cells = row.map((cell, i) => {
      if (cell === null) return '';
      if (typeof cell === 'number') {
        if (!Number.isFinite(cell)) throw notFiniteError(`${header[i]} = ${cell}`);
        return String(cell);
      }
      return csvCell(cell);
    });
    lines.push(cells.join(','));
  }
  return `${lines.join('\n')}\n`;
}
