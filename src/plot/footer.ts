import { CAUTION } from '../base/caution.js';
import { FIGURE_TEXT } from './styles.js';
import type { SvgDocument } from './svg.js';
import { wrapText } from './text.js';

const { footerPx, sidePx } = FIGURE_TEXT;

/** Height of the caution footer of a figure `widthPx` wide, px, rule and margins included. */
export function cautionHeightPx(widthPx: number): number {
  return 6 + wrapText(CAUTION, widthPx - 2 * sidePx, footerPx).length * (footerPx + 3) + 6;
}

/** The standing caution in small print under a rule at `top`, as every figure ends. */
export function drawCaution(doc: SvgDocument, top: number, widthPx: number): void {
  const footerLines = wrapText(CAUTION, widthPx - 2 * sidePx, footerPx);
  const footer = doc.element(doc.root, 'g', { class: 'caution', fill: '#444444', 'font-size': footerPx });
  doc.element(footer, 'line', {
    x1: sidePx,
    x2: widthPx - sidePx,
    y1: top,
    y2: top,
    stroke: '#999999',
    'stroke-width': 0.6,
  });
  footerLines.forEach((text, i) => {
    doc.text(footer, text, { x: sidePx, y: top + 4 + (i + 1) * (footerPx + 3) - 2 });
  });
}
