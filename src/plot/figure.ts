import { drawFooter, layoutFooter } from './footer.js';
import { layoutHeader, startPage } from './header.js';
import { layoutPanel } from './layout.js';
import { drawLegend, legendLayout } from './legend.js';
import { drawPanel, type PanelSpec } from './panel.js';
import { FIGURE_TEXT, FIGURE_WIDTH_PX } from './styles.js';

const { tickPx, axisTitlePx, sidePx } = FIGURE_TEXT;
const RIGHT_MARGIN_PX = 18;

export interface FigureSpec {
  title: string;
  subtitle?: readonly string[];
  panels: readonly PanelSpec[];
  legendTitle?: string;
  /** Lines of small print above the caution (method notes, what is left off the plot). */
  notes?: readonly string[];
  /** Room right of the plots, px, e.g. for labels at the right end of lines; default 18. */
  rightMarginPx?: number;
}

/**
 * Draw a figure: title and subtitle, panels stacked on one page width, a legend, notes and the
 * standing caution as the footer. Returns standalone SVG text.
 */
export function renderFigure(spec: FigureSpec): string {
  const widthPx = FIGURE_WIDTH_PX;
  const layouts = spec.panels.map(layoutPanel);
  const yLabelWidth = Math.max(...layouts.map((l) => l.yLabelWidthPx), 20);
  const plotLeft = sidePx + axisTitlePx + 8 + yLabelWidth + 7;
  const plotWidth = widthPx - plotLeft - (spec.rightMarginPx ?? RIGHT_MARGIN_PX);
  const header = layoutHeader(spec.title, spec.subtitle, widthPx);
  const legendEntries = layouts.flatMap((l) => l.series.filter((s) => s.series.legend !== false));
  const legendRows = legendLayout(legendEntries, spec.legendTitle, plotWidth);

  let y = header.bottom + 10;
  const panelTops: number[] = [];
  for (const layout of layouts) {
    y += layout.spec.gapAbovePx ?? 0;
    panelTops.push(y);
    y += layout.spec.heightPx + (layout.spec.xLabels === false ? 10 : tickPx + 8 + axisTitlePx + 12);
  }
  const legendTop = y;
  if (legendRows.length > 0) y += legendRows.length * 16 + 6;
  const footer = layoutFooter(spec.notes, widthPx, y);

  const doc = startPage(header, widthPx, Math.ceil(footer.bottom));
  layouts.forEach((layout, i) => {
    const plot = { left: plotLeft, top: panelTops[i], width: plotWidth, height: layout.spec.heightPx };
    drawPanel(doc, layout, plot, i);
  });
  drawLegend(doc, legendRows, plotLeft, legendTop);
  drawFooter(doc, footer);
  return doc.serialize();
}
