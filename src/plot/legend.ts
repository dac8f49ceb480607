import type { Series } from './panel.js';
import { FIGURE_TEXT, type SeriesStyle, TEXT_COLOUR } from './styles.js';
import type { SvgDocument } from './svg.js';
import { textWidthPx } from './ticks.js';

const { tickPx } = FIGURE_TEXT;

export interface LegendItem {
  label: string;
  style: SeriesStyle | undefined;
  offsetPx: number;
}

const SAMPLE_PX = 30;

/** The legend in rows that fit `widthPx`: an optional title, then a sample line and label per series. */
export function legendLayout(
  entries: { series: Series; style: SeriesStyle }[],
  title: string | undefined,
  widthPx: number,
): LegendItem[][] {
  if (entries.length === 0) return [];
  const rows: LegendItem[][] = [[]];
  let offset = 0;
  const add = (label: string, style: SeriesStyle | undefined) => {
    const width = (style ? SAMPLE_PX + 5 : 0) + textWidthPx(label, tickPx) + 16;
    if (offset > 0 && offset + width > widthPx) {
      rows.push([]);
      offset = 0;
    }
    rows[rows.length - 1].push({ label, style, offsetPx: offset });
    offset += width;
  };
  if (title !== undefined) add(title, undefined);
  for (const entry of entries) add(entry.series.label, entry.style);
  return rows;
}

/** Draw the legend rows with their left edge at `left` and top at `top`. */
export function drawLegend(doc: SvgDocument, rows: LegendItem[][], left: number, top: number): void {
  if (rows.length === 0) return;
  const legend = doc.element(doc.root, 'g', { class: 'legend', 'font-size': tickPx, fill: TEXT_COLOUR });
  rows.forEach((row, r) => {
    const middle = top + r * 16 + 10;
    for (const item of row) {
      let textX = left + item.offsetPx;
      if (item.style) {
        doc.element(legend, 'line', {
          class: 'legend-sample',
          x1: textX,
          x2: textX + SAMPLE_PX,
          y1: middle,
          y2: middle,
          stroke: item.style.color,
          'stroke-width': item.style.widthPx,
          'stroke-dasharray': item.style.dash,
        });
        textX += SAMPLE_PX + 5;
      }
      doc.text(legend, item.label, { x: textX, y: middle + tickPx * 0.35 });
    }
  });
}
