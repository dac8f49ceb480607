import { finishPage } from './footer.js';
import { startPage } from './header.js';
import { layoutPanel } from './layout.js';
import { drawLegend } from './legend.js';
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
  const layouts = spec.panels.map(layoutPanel);
  const yLabelWidth = Math.max(...layouts.map((l) => l.yLabelWidthPx), 20);
  const left = sidePx + axisTitlePx + 8 + yLabelWidth + 7;
  const width = FIGURE_WIDTH_PX - left - (spec.rightMarginPx ?? RIGHT_MARGIN_PX);
  const { page, bottom } = startPage(spec.title, spec.subtitle);
  let y = bottom + 10;
  layouts.forEach((layout, i) => {
    y += layout.spec.gapAbovePx ?? 0;
    drawPanel(page.doc, layout, { left, top: y, width, height: layout.spec.heightPx }, i);
    y += layout.spec.heightPx + (layout.spec.xLabels === false ? 10 : tickPx + 8 + axisTitlePx + 12);
  });
  const legendEntries = layouts.flatMap((l) => l.series.filter((s) => s.series.legend !== false));
  y = drawLegend(page.doc, legendEntries, spec.legendTitle, { left, top: y, widthPx: width });
  return finishPage(page, spec.notes, y);
}
