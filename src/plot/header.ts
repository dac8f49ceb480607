import { FIGURE_TEXT, FIGURE_WIDTH_PX, TEXT_COLOUR } from './styles.js';
import { createSvgDocument, type SvgDocument } from './svg.js';
import { wrapText } from './text.js';

const { titlePx, subtitlePx, sidePx } = FIGURE_TEXT;

/** A figure while it is drawn, top to bottom: its document and its white background. */
export interface Page {
  doc: SvgDocument;
  /** Made as tall as the page when the page is finished (`finishPage`). */
  background: SVGElement;
}

/**
 * A new page the width of every figure, with its title element and its header: the title (bold)
 * and the subtitle lines, wrapped to the page. Returns the page and where the header ends, px.
 */
export function startPage(title: string, subtitle: readonly string[] = []): { page: Page; bottom: number } {
  const doc = createSvgDocument(FIGURE_WIDTH_PX, 0);
  doc.element(doc.root, 'title').textContent = title;
  const background = doc.element(doc.root, 'rect', { width: FIGURE_WIDTH_PX, height: 0, fill: '#ffffff' });
  const group = doc.element(doc.root, 'g', { class: 'header', fill: TEXT_COLOUR });
  const textWidth = FIGURE_WIDTH_PX - 2 * sidePx;
  let line = 10;
  for (const text of wrapText(title, textWidth, titlePx)) {
    line += titlePx + 2;
    doc.text(group, text, {
      x: sidePx,
      y: line,
      'font-size': titlePx,
      'font-weight': 'bold',
      class: 'title',
    });
    line += 2;
  }
  for (const text of subtitle.flatMap((s) => wrapText(s, textWidth, subtitlePx))) {
    line += subtitlePx + 3;
    doc.text(group, text, { x: sidePx, y: line - 1, 'font-size': subtitlePx, class: 'subtitle' });
  }
  return { page: { doc, background }, bottom: line };
}
