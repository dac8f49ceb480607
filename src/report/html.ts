import { formatNumber as formatBase } from '../base/numbers.js';
import { markupSafe } from '../base/printable.js';

/** A figure of the report: the SVG text as the figure functions write it, and the file it is also saved as. */
export interface ReportFigure {
  file: string;
  caption: string;
  svg: string;
}

const ENTITIES = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/**
 * Escape text for HTML element content and double-quoted attribute values; terminal escape
 * sequences and characters XML forbids (a file name may hold them) are removed first.
 */
export function escapeHtml(text: string): string {
  return markupSafe(text).replace(/[&<>"']/g, (character) => ENTITIES[character as keyof typeof ENTITIES]);
}

/** A table cell value: text is escaped; numbers are written with `digits` significant figures. */
export type Cell = string | number | null;

/** A number for a table: `digits` significant figures, "—" for null or NaN. */
export function formatNumber(value: number | null | undefined, digits = 4): string {
  if (value === null || value === undefined || Number.isNaN(value)) return '—';
  return formatBase(value, digits);
}

/** "a to b s", each with four significant figures. */
export function span(fromS: number | null, toS: number | null): string {
  return `${formatNumber(fromS)} to ${formatNumber(toS)} s`;
}

/**
 * An HTML table with a caption; `header` cells carry their unit in the text (e.g. "PSA (g)").
 * Every cell is escaped; numbers are formatted with four significant figures.
 */
export function table(
  caption: string,
  header: readonly string[],
  rows: readonly (readonly Cell[])[],
): string {
  const cell = (value: Cell) =>
    typeof value === 'number'
      ? `<td class="num">${escapeHtml(formatNumber(value))}</td>`
      : `<td>${escapeHtml(value ?? '—')}</td>`;
  const head = header.map((h) => `<th scope="col">${escapeHtml(h)}</th>`).join('');
  const body = rows.map((row) => `<tr>${row.map(cell).join('')}</tr>`).join('\n');
  return `<table>\n<caption>${escapeHtml(caption)}</caption>\n<thead><tr>${head}</tr></thead>\n<tbody>\n${body}\n</tbody>\n</table>`;
}

/** A two-column table of label and value (already formatted text). */
export function definitionTable(caption: string, rows: readonly (readonly [string, string])[]): string {
  const body = rows
    .map(
      ([label, value]) => `<tr><th scope="row">${escapeHtml(label)}</th><td>${escapeHtml(value)}</td></tr>`,
    )
    .join('\n');
  return `<table class="facts">\n<caption>${escapeHtml(caption)}</caption>\n<tbody>\n${body}\n</tbody>\n</table>`;
}

/** A bulleted list of escaped items. */
export function list(items: readonly string[]): string {
  return `<ul>\n${items.map((item) => `<li>${escapeHtml(item)}</li>`).join('\n')}\n</ul>`;
}

/** A paragraph of escaped text. */
export function paragraph(text: string, className?: string): string {
  return `<p${className === undefined ? '' : ` class="${escapeHtml(className)}"`}>${escapeHtml(text)}</p>`;
}
