import { CAUTION } from '../base/caution.js';
import { FIGURE_TEXT, TEXT_COLOUR } from './styles.js';
import type { SvgDocument } from './svg.js';
import { wrapText } from './text.js';

const { footerPx, notePx, sidePx } = FIGURE_TEXT;

/** Where the foot of a figure goes: the notes' lines from `top`, then the caution under its rule. */
export interface FooterLayout {
  noteLines: string[];
  top: number;
  cautionTop: number;
  /** The bottom of the page, px. */
  bottom: number;
  widthPx: number;
}

/** Lay out the foot of a figure `widthPx` wide from `top`: small-print notes, then the caution. */
export function layoutFooter(
  notes: readonly string[] | undefined,
  widthPx: number,
  top: number,
): FooterLayout {
  const textWidth = widthPx - 2 * sidePx;
  const noteLines = (notes ?? []).flatMap((n) => wrapText(n, textWidth, notePx));
  const cautionTop = top + noteLines.length * (notePx + 3) + 6;
  const cautionLines = wrapText(CAUTION, textWidth, footerPx).length;
  return {
    noteLines,
    top,
    cautionTop,
    bottom: cautionTop + (6 + cautionLines * (footerPx + 3) + 6),
    widthPx,
  };
}

/** Draw the notes and, under a rule, the standing caution in small print, as every figure ends. */
export function drawFooter(doc: SvgDocument, layout: FooterLayout): void {
  const { noteLines, top, cautionTop, widthPx } = layout;
  const notes = doc.element(doc.root, 'g', { class: 'notes', fill: TEXT_COLOUR, 'font-size': notePx });
  noteLines.forEach((text, i) => {
    doc.text(notes, text, { x: sidePx, y: top + (i + 1) * (notePx + 3) - 2 });
  });
  const footer = doc.element(doc.root, 'g', { class: 'caution', fill: '#444444', 'font-size': footerPx });
  doc.element(footer, 'line', {
    x1: sidePx,
    x2: widthPx - sidePx,
    y1: cautionTop,
    y2: cautionTop,
    stroke: '#999999',
    'stroke-width': 0.6,
  });
  wrapText(CAUTION, widthPx - 2 * sidePx, footerPx).forEach((text, i) => {
    doc.text(footer, text, { x: sidePx, y: cautionTop + 4 + (i + 1) * (footerPx + 3) - 2 });
  });
}
