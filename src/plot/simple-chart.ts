import type { ScaleContinuousNumeric } from 'd3-scale';
import { line } from 'd3-shape';
import { cautionLines } from '../caution.js';

/**
 * A small string-built SVG chart frame for the `info` figures (Husid curve, Fourier spectrum):
 * axes, ticks, labels, a title and the caution footer. Every text is escaped.
 */

export const CHART_WIDTH = 760;
/** Height of the frame down to the bottom of the plot area; notes and the caution go below. */
const PLOT_FRAME_HEIGHT = 520;
export const MARGIN = { top: 48, right: 24, bottom: 150, left: 78 };
/** Characters of a note line (11 px sans-serif across the figure). */
const NOTE_WIDTH = 112;
const FONT = 'font-family="sans-serif"';

/** Escape text for SVG/XML content and attribute values. */
export function escapeXml(text: string): string {
  return text
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&#39;');
}

export interface Series {
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  stroke: string;
  width: number;
  dash?: string;
}

export interface ChartSpec {
  title: string;
  xLabel: string;
  yLabel: string;
  x: ScaleContinuousNumeric<number, number>;
  y: ScaleContinuousNumeric<number, number>;
  series: Series[];
  /** Extra SVG drawn inside the plot area (already escaped). */
  overlay?: string;
  /** Lines of notes under the axes (escaped here). */
  notes?: string[];
  tickFormat?: { x?: (v: number) => string; y?: (v: number) => string };
}

export const plotLeft = MARGIN.left;
export const plotRight = CHART_WIDTH - MARGIN.right;
export const plotTop = MARGIN.top;
export const plotBottom = PLOT_FRAME_HEIGHT - MARGIN.bottom;

/** A number as a short tick label. */
export function shortNumber(value: number): string {
  return Number(value.toPrecision(3)).toString();
}

/** Break text into lines of at most `width` characters at spaces. */
export function wrapText(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    if (line.length > 0 && line.length + 1 + word.length > width) {
      lines.push(line);
      line = `  ${word}`;
    } else {
      line = line.length > 0 ? `${line} ${word}` : word;
    }
  }
  if (line.length > 0) lines.push(line);
  return lines;
}

export function renderChart(spec: ChartSpec): string {
  const { x, y } = spec;
  const notes = (spec.notes ?? []).flatMap((note) => wrapText(note, NOTE_WIDTH));
  const caution = cautionLines(118);
  const height = plotBottom + 58 + 15 * notes.length + 10 + 13 * caution.length;
  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${CHART_WIDTH}" height="${height}" viewBox="0 0 ${CHART_WIDTH} ${height}">`,
  );
  out.push(`<rect width="${CHART_WIDTH}" height="${height}" fill="#ffffff"/>`);
  out.push(
    `<text x="${CHART_WIDTH / 2}" y="28" text-anchor="middle" font-size="16" ${FONT}>${escapeXml(spec.title)}</text>`,
  );
  const fx = spec.tickFormat?.x ?? shortNumber;
  const fy = spec.tickFormat?.y ?? shortNumber;
  for (const t of x.ticks(8)) {
    const px = x(t).toFixed(2);
    out.push(`<line x1="${px}" x2="${px}" y1="${plotTop}" y2="${plotBottom}" stroke="#e3e3e3"/>`);
    out.push(
      `<text x="${px}" y="${plotBottom + 16}" text-anchor="middle" font-size="11" ${FONT}>${escapeXml(fx(t))}</text>`,
    );
  }
  for (const t of y.ticks(6)) {
    const py = y(t).toFixed(2);
    out.push(`<line x1="${plotLeft}" x2="${plotRight}" y1="${py}" y2="${py}" stroke="#e3e3e3"/>`);
    out.push(
      `<text x="${plotLeft - 6}" y="${py}" dy="0.35em" text-anchor="end" font-size="11" ${FONT}>${escapeXml(fy(t))}</text>`,
    );
  }
  out.push(
    `<rect x="${plotLeft}" y="${plotTop}" width="${plotRight - plotLeft}" height="${plotBottom - plotTop}" fill="none" stroke="#333333"/>`,
  );
  out.push(
    `<text x="${(plotLeft + plotRight) / 2}" y="${plotBottom + 36}" text-anchor="middle" font-size="13" ${FONT}>${escapeXml(spec.xLabel)}</text>`,
  );
  out.push(
    `<text transform="translate(20 ${(plotTop + plotBottom) / 2}) rotate(-90)" text-anchor="middle" font-size="13" ${FONT}>${escapeXml(spec.yLabel)}</text>`,
  );
  out.push(
    `<clipPath id="plot-area"><rect x="${plotLeft}" y="${plotTop}" width="${plotRight - plotLeft}" height="${plotBottom - plotTop}"/></clipPath>`,
  );
  out.push('<g clip-path="url(#plot-area)">');
  for (const s of spec.series) {
    const points = Array.from({ length: s.x.length }, (_, i) => [x(s.x[i]), y(s.y[i])] as [number, number]);
    const path = line().digits(2)(points.filter(([px, py]) => Number.isFinite(px) && Number.isFinite(py)));
    if (path === null) continue;
    const dash = s.dash === undefined ? '' : ` stroke-dasharray="${s.dash}"`;
    out.push(`<path d="${path}" fill="none" stroke="${s.stroke}" stroke-width="${s.width}"${dash}/>`);
  }
  if (spec.overlay !== undefined) out.push(spec.overlay);
  out.push('</g>');
  let lineY = plotBottom + 58;
  for (const note of notes) {
    out.push(`<text x="${plotLeft}" y="${lineY}" font-size="11" ${FONT}>${escapeXml(note)}</text>`);
    lineY += 15;
  }
  lineY += 10;
  for (const text of caution) {
    out.push(`<text x="12" y="${lineY}" font-size="10" fill="#555555" ${FONT}>${escapeXml(text)}</text>`);
    lineY += 13;
  }
  out.push('</svg>');
  return `${out.join('\n')}\n`;
}
