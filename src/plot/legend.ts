import { drawMarkers, type Series } from './panel.js';
import { FIGURE_TEXT, type SeriesStyle, TEXT_COLOUR } from './styles.js';
import type { SvgDocument } from './svg.js';
import { textWidthPx } from './ticks.js';

const { tickPx } = FIGURE_TEXT;

const SAMPLE_PX = 30;

/**
 * Draw the legend from (`left`, `top`) in rows that fit `widthPx`: an optional title, then a sample
 * line and label per series. Returns where it ends, px (`top` when it shows nothing).
 */
export function drawLegend(
  doc: SvgDocument,
  entries: readonly { series: Series; style: SeriesStyle }[],
  title: string | undefined,
  { left, top, widthPx }: { left: number; top: number; widthPx: number },
): number {
  if (entries.length === 0) return top;
  const legend = doc.element(doc.root, 'g', { class: 'legend', 'font-size': tickPx, fill: TEXT_COLOUR });
  let row = 0;
  let offset = 0;
  const add = (label: string, style?: SeriesStyle) => {
    const width = (style ? SAMPLE_PX + 5 : 0) + textWidthPx(label, tickPx) + 16;
    if (offset > 0 && offset + width > widthPx) {
      row += 1;
      offset = 0;
    }
    const middle = top + row * 16 + 10;
    let textX = left + offset;
    if (style) {
      doc.element(legend, 'line', {
        class: 'legend-sample',
        x1: textX,
        x2: textX + SAMPLE_PX,
        y1: middle,
        y2: middle,
        stroke: style.color,
        'stroke-width': style.widthPx,
        'stroke-dasharray': style.dash,
      });
      if (style.marker) drawMarkers(doc, legend, style, [[textX + SAMPLE_PX / 2, middle]]);
      textX += SAMPLE_PX + 5;
    }
    doc.text(legend, label, { x: textX, y: middle + tickPx * 0.35 });
    offset += width;
  };
  if (title !== undefined) add(title);
  for (const { series, style } of entries) add(series.label, style);
  return top + (row + 1) * 16 + 6;
}
