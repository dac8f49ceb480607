import { CAUTION } from '../base/caution.js';
import type { Page } from './header.js';
import { FIGURE_TEXT, FIGURE_WIDTH_PX, TEXT_COLOUR } from './styles.js';
import { wrapText } from './text.js';

const { footerPx, notePx, sidePx } = FIGURE_TEXT;

/**
 * End a page as every figure ends: the notes in small print from `top`, then the standing caution
 * under a rule; the page is made as tall as what was drawn. Returns the standalone SVG text.
 */
export function finishPage({ doc, background }: Page, notes: readonly string[] = [], top: number): string {
  const textWidth = FIGURE_WIDTH_PX - 2 * sidePx;
  const noteLines = notes.flatMap((n) => wrapText(n, textWidth, notePx));
  const group = doc.element(doc.root, 'g', { class: 'notes', fill: TEXT_COLOUR, 'font-size': notePx });
  noteLines.forEach((text, i) => {
    doc.text(group, text, { x: sidePx, y: top + (i + 1) * (notePx + 3) - 2 });
  });
  const cautionTop = top + noteLines.length * (notePx + 3) + 6;
  const footer = doc.element(doc.root, 'g', { class: 'caution', fill: '#444444', 'font-size': footerPx });
  const rule = { x1: sidePx, x2: FIGURE_WIDTH_PX - sidePx, y1: cautionTop, y2: cautionTop };
  doc.element(footer, 'line', { ...rule, stroke: '#999999', 'stroke-width': 0.6 });
  const cautionLines = wrapText(CAUTION, textWidth, footerPx);
  cautionLines.forEach((text, i) => {
    doc.text(footer, text, { x: sidePx, y: cautionTop + 4 + (i + 1) * (footerPx + 3) - 2 });
  });
  const heightPx = Math.ceil(cautionTop + (6 + cautionLines.length * (footerPx + 3) + 6));
  doc.set(doc.root, { height: heightPx, viewBox: `0 0 ${FIGURE_WIDTH_PX} ${heightPx}` });
  doc.set(background, { height: heightPx });
  return doc.serialize();
}
