import { cautionHeightPx, drawCaution } from './footer.js';
import { layoutPanel } from './layout.js';
import { drawLegend, legendLayout } from './legend.js';
import { drawPanel, type PanelSpec } from './panel.js';
import { FIGURE_TEXT, FIGURE_WIDTH_PX, TEXT_COLOUR } from './styles.js';
import { createSvgDocument } from './svg.js';
import { wrapText } from './text.js';

const { titlePx, subtitlePx, tickPx, axisTitlePx, notePx, sidePx } = FIGURE_TEXT;
const RIGHT_MARGIN_PX = 18;

export interface FigureSpec {
  title: string;
  subtitle?: readonly string[];
  panels: readonly PanelSpec[];
  legendTitle?: string;
  /** Lines of small print above the caution (method notes, what is left off the plot). */
  notes?: readonly string[];
  widthPx?: number;
  /** Room right of the plots, px, e.g. for labels at the right end of lines; default 18. */
  rightMarginPx?: number;
}

/**
 * Draw a figure: title and subtitle, panels stacked on one page width, a legend, notes and the
 * standing caution as the footer. Returns standalone SVG text.
 */
export function renderFigure(spec: FigureSpec): string {
  const widthPx = spec.widthPx ?? FIGURE_WIDTH_PX;
  const layouts = spec.panels.map(layoutPanel);
  const yLabelWidth = Math.max(...layouts.map((l) => l.yLabelWidthPx), 20);
  const plotLeft = sidePx + axisTitlePx + 8 + yLabelWidth + 7;
  const plotWidth = widthPx - plotLeft - (spec.rightMarginPx ?? RIGHT_MARGIN_PX);
  const textWidth = widthPx - 2 * sidePx;

  const titleLines = wrapText(spec.title, textWidth, titlePx);
  const subtitleLines = (spec.subtitle ?? []).flatMap((s) => wrapText(s, textWidth, subtitlePx));
  const legendEntries = layouts.flatMap((l) => l.series.filter((s) => s.series.legend !== false));
  const legendRows = legendLayout(legendEntries, spec.legendTitle, plotWidth);
  const noteLines = (spec.notes ?? []).flatMap((n) => wrapText(n, textWidth, notePx));

  let y = 10;
  const titleTop = y;
  y += titleLines.length * (titlePx + 4) + subtitleLines.length * (subtitlePx + 3) + 10;
  const panelTops: number[] = [];
  for (const layout of layouts) {
    y += layout.spec.gapAbovePx ?? 0;
    panelTops.push(y);
    y += layout.spec.heightPx + (layout.spec.xLabels === false ? 10 : tickPx + 8 + axisTitlePx + 12);
  }
  const legendTop = y;
  if (legendRows.length > 0) y += legendRows.length * 16 + 6;
  const notesTop = y;
  y += noteLines.length * (notePx + 3);
  const footerTop = y + 6;
  y = footerTop + cautionHeightPx(widthPx);
  const heightPx = Math.ceil(y);

  const doc = createSvgDocument(widthPx, heightPx);
  doc.element(doc.root, 'title').textContent = spec.title;
  doc.element(doc.root, 'rect', { width: widthPx, height: heightPx, fill: '#ffffff' });
  const header = doc.element(doc.root, 'g', { class: 'header', fill: TEXT_COLOUR });
  let line = titleTop;
  for (const text of titleLines) {
    line += titlePx + 2;
    doc.text(header, text, {
      x: sidePx,
      y: line,
      'font-size': titlePx,
      'font-weight': 'bold',
      class: 'title',
    });
    line += 2;
  }
  for (const text of subtitleLines) {
    line += subtitlePx + 3;
    doc.text(header, text, { x: sidePx, y: line - 1, 'font-size': subtitlePx, class: 'subtitle' });
  }
  layouts.forEach((layout, i) => {
    drawPanel(
      doc,
      layout,
      { left: plotLeft, top: panelTops[i], width: plotWidth, height: layout.spec.heightPx },
      i,
    );
  });
  drawLegend(doc, legendRows, plotLeft, legendTop);
  const notes = doc.element(doc.root, 'g', { class: 'notes', fill: TEXT_COLOUR, 'font-size': notePx });
  noteLines.forEach((text, i) => {
    doc.text(notes, text, { x: sidePx, y: notesTop + (i + 1) * (notePx + 3) - 2 });
  });
  drawCaution(doc, footerTop, widthPx);
  return doc.serialize();
}
