import { FIGURE_TEXT, TEXT_COLOUR } from './styles.js';
import { createSvgDocument, type SvgDocument } from './svg.js';
import { wrapText } from './text.js';

const { titlePx, subtitlePx, sidePx } = FIGURE_TEXT;
const TOP_PX = 10;

/** The head of a figure: its title and subtitle wrapped to the page width. */
export interface HeaderLayout {
  title: string;
  titleLines: string[];
  subtitleLines: string[];
  /** Where the header's last line ends, px from the top of the page. */
  bottom: number;
}

/** Wrap a figure's title (bold) and subtitle lines to a page `widthPx` wide. */
export function layoutHeader(
  title: string,
  subtitle: readonly string[] | undefined,
  widthPx: number,
): HeaderLayout {
  const textWidth = widthPx - 2 * sidePx;
  const titleLines = wrapText(title, textWidth, titlePx);
  const subtitleLines = (subtitle ?? []).flatMap((s) => wrapText(s, textWidth, subtitlePx));
  const bottom = TOP_PX + titleLines.length * (titlePx + 4) + subtitleLines.length * (subtitlePx + 3);
  return { title, titleLines, subtitleLines, bottom };
}

/** A new white page `widthPx` × `heightPx` carrying the figure's title element and its header. */
export function startPage(header: HeaderLayout, widthPx: number, heightPx: number): SvgDocument {
  const doc = createSvgDocument(widthPx, heightPx);
  doc.element(doc.root, 'title').textContent = header.title;
  doc.element(doc.root, 'rect', { width: widthPx, height: heightPx, fill: '#ffffff' });
  const group = doc.element(doc.root, 'g', { class: 'header', fill: TEXT_COLOUR });
  let line = TOP_PX;
  for (const text of header.titleLines) {
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
  for (const text of header.subtitleLines) {
    line += subtitlePx + 3;
    doc.text(group, text, { x: sidePx, y: line - 1, 'font-size': subtitlePx, class: 'subtitle' });
  }
  return doc;
}
