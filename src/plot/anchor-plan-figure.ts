import { drawFooter, layoutFooter } from './footer.js';
import { layoutHeader, startPage } from './header.js';
import { makeScale } from './layout.js';
import { FIGURE_TEXT, FIGURE_WIDTH_PX, FRAME_COLOUR, GRID_COLOUR, HALO, TEXT_COLOUR } from './styles.js';
import { linearTicks, textWidthPx } from './ticks.js';

/** What the plan view needs (plain values in the user's units; no dependency on anchorage types). */
export interface AnchorPlanInput {
  title: string;
  forceUnit: string;
  lengthUnit: string;
  anchors: readonly { x: number; y: number; tension: number }[];
  /** 0-based index of the governing anchor. */
  governingAnchor: number;
  /** Direction of the horizontal force that governs, degrees counter-clockwise from +x. */
  directionDeg: number;
  cgPlan: readonly [number, number];
  centroid: readonly [number, number];
  /** Lines under the title (demand, method). */
  subtitle?: readonly string[];
  /** Small print above the caution. */
  notes?: readonly string[];
}

const GOVERNING = '#D55E00';
const ANCHOR = '#0072B2';
const MASS = '#111111';

/**
 * Plan view of an anchor pattern as SVG text: each anchor with its worst tension (circle area in
 * proportion), the centre of mass, the anchors' centroid and an arrow for the direction of the
 * horizontal force that governs. Equal scales on x and y; the same header, fonts and caution footer
 * as the other figures, all text escaped by the document's serializer.
 */
export function anchorPlanSvg(input: AnchorPlanInput): string {
  const widthPx = FIGURE_WIDTH_PX;
  const { tickPx, axisTitlePx, sidePx } = FIGURE_TEXT;
  const header = layoutHeader(input.title, input.subtitle, widthPx);

  const xs = [...input.anchors.map((a) => a.x), input.cgPlan[0], input.centroid[0]];
  const ys = [...input.anchors.map((a) => a.y), input.cgPlan[1], input.centroid[1]];
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const span = Math.max(maxX - minX, maxY - minY) || 1;
  const half = span / 2 + span * 0.3;
  const midX = (minX + maxX) / 2;
  const midY = (minY + maxY) / 2;
  const plotSize = 400;
  const plotLeft = (widthPx - plotSize) / 2;
  const plotTop = header.bottom + 16;
  const legendTop = plotTop + plotSize + tickPx + 8 + axisTitlePx + 16;
  const footer = layoutFooter(input.notes, widthPx, legendTop + 20);
  const doc = startPage(header, widthPx, Math.ceil(footer.bottom));

  const px = makeScale('linear', [midX - half, midX + half], [plotLeft, plotLeft + plotSize]);
  const py = makeScale('linear', [midY - half, midY + half], [plotTop + plotSize, plotTop]);
  const panel = doc.element(doc.root, 'g', { class: 'panel', 'data-panel': 0 });
  const extent = (text: string) => textWidthPx(text, tickPx);
  const xTicks = linearTicks(px.domain() as [number, number], (v) => px(v), extent, plotSize);
  const yTicks = linearTicks(
    py.domain() as [number, number],
    (v) => py(v),
    () => tickPx * 1.3,
    plotSize,
  );
  const grid = doc.element(panel, 'g', { class: 'grid', stroke: GRID_COLOUR, 'stroke-width': 0.6 });
  for (const v of xTicks.major)
    doc.element(grid, 'line', { x1: px(v), x2: px(v), y1: plotTop, y2: plotTop + plotSize });
  for (const v of yTicks.major)
    doc.element(grid, 'line', { x1: plotLeft, x2: plotLeft + plotSize, y1: py(v), y2: py(v) });
  doc.element(panel, 'rect', {
    class: 'frame',
    x: plotLeft,
    y: plotTop,
    width: plotSize,
    height: plotSize,
    fill: 'none',
    stroke: FRAME_COLOUR,
    'stroke-width': 0.8,
  });
  const labels = doc.element(panel, 'g', { class: 'tick-labels', fill: TEXT_COLOUR, 'font-size': tickPx });
  const xLabels = doc.element(labels, 'g', { class: 'x-ticks', 'text-anchor': 'middle' });
  for (const { value, text } of xTicks.labels)
    doc.text(xLabels, text, { x: px(value), y: plotTop + plotSize + 7 + tickPx, 'data-value': value });
  const yLabels = doc.element(labels, 'g', { class: 'y-ticks', 'text-anchor': 'end' });
  for (const { value, text } of yTicks.labels)
    doc.text(yLabels, text, { x: plotLeft - 6, y: py(value) + tickPx * 0.35, 'data-value': value });
  doc.text(panel, `x (${input.lengthUnit})`, {
    class: 'axis-title x-title',
    x: plotLeft + plotSize / 2,
    y: plotTop + plotSize + 7 + tickPx + 6 + axisTitlePx,
    'text-anchor': 'middle',
    'font-size': axisTitlePx,
    fill: TEXT_COLOUR,
  });
  const yTitleX = plotLeft - 6 - Math.max(...yTicks.labels.map((l) => extent(l.text)), 20) - 10;
  doc.text(panel, `y (${input.lengthUnit})`, {
    class: 'axis-title y-title',
    transform: `translate(${yTitleX}, ${plotTop + plotSize / 2}) rotate(-90)`,
    'text-anchor': 'middle',
    'font-size': axisTitlePx,
    fill: TEXT_COLOUR,
  });

  const marks = doc.element(panel, 'g', { class: 'plan' });
  // The governing direction: an arrow through the centre of mass, where the force acts.
  const [gx, gy] = [px(input.cgPlan[0]), py(input.cgPlan[1])];
  const rad = (input.directionDeg * Math.PI) / 180;
  const [ux, uy] = [Math.cos(rad), -Math.sin(rad)];
  const length = plotSize * 0.3;
  const [tipX, tipY] = [gx + ux * length, gy + uy * length];
  const arrow = doc.element(marks, 'g', { class: 'direction', 'data-direction-deg': input.directionDeg });
  doc.element(arrow, 'path', {
    d: `M${gx - ux * length * 0.4},${gy - uy * length * 0.4}L${tipX - ux * 8},${tipY - uy * 8}`,
    stroke: GOVERNING,
    'stroke-width': 2,
    fill: 'none',
  });
  const head = (angle: number) => [tipX - 11 * Math.cos(angle), tipY - 11 * Math.sin(angle)];
  const a = Math.atan2(uy, ux);
  const [h1x, h1y] = head(a - 0.38);
  const [h2x, h2y] = head(a + 0.38);
  doc.element(arrow, 'path', { d: `M${tipX},${tipY}L${h1x},${h1y}L${h2x},${h2y}Z`, fill: GOVERNING });
  const arrowText = `force direction ${input.directionDeg.toFixed(1)}°`;
  const arrowTextWidth = textWidthPx(arrowText, 9.5);
  const textX = Math.min(plotLeft + plotSize - 4 - (ux >= 0 ? arrowTextWidth : 0), tipX + (ux >= 0 ? 6 : -6));
  doc.text(arrow, arrowText, {
    x: Math.max(plotLeft + 4 + (ux < 0 ? arrowTextWidth : 0), textX),
    y: Math.min(plotTop + plotSize - 6, Math.max(plotTop + 12, tipY + (uy <= 0 ? -6 : 14))),
    'text-anchor': ux >= 0 ? 'start' : 'end',
    'font-size': 9.5,
    fill: GOVERNING,
    ...HALO,
  });

  const maxTension = Math.max(...input.anchors.map((p) => p.tension), 0);
  input.anchors.forEach((p, i) => {
    const governing = i === input.governingAnchor && maxTension > 0;
    const r = 4 + (maxTension > 0 ? 8 * Math.sqrt(p.tension / maxTension) : 0);
    const [cx, cy] = [px(p.x), py(p.y)];
    const anchor = doc.element(marks, 'g', {
      class: 'anchor',
      'data-tension': p.tension,
      'data-index': i + 1,
    });
    doc.element(anchor, 'circle', {
      cx,
      cy,
      r,
      fill: governing ? GOVERNING : ANCHOR,
      'fill-opacity': 0.85,
      stroke: '#ffffff',
      'stroke-width': 1,
    });
    // Centred above the anchors of the upper half, below those of the lower half, kept in the frame.
    const label = `${i + 1}: T = ${format(p.tension)} ${input.forceUnit}${governing ? ' (governs)' : ''}`;
    const halfWidth = textWidthPx(label, 9.5) / 2;
    doc.text(anchor, label, {
      x: Math.min(plotLeft + plotSize - halfWidth - 3, Math.max(plotLeft + halfWidth + 3, cx)),
      y: cy + (p.y >= input.centroid[1] ? -r - 4 : r + 12),
      'text-anchor': 'middle',
      'font-size': 9.5,
      fill: TEXT_COLOUR,
      ...HALO,
    });
  });
  const [kx, ky] = [px(input.centroid[0]), py(input.centroid[1])];
  doc.element(marks, 'path', { class: 'centroid', ...centroidMark(kx, ky) });
  doc.element(marks, 'path', { class: 'centre-of-mass', ...massMark(gx, gy, 7) });

  const legend = doc.element(doc.root, 'g', { class: 'legend', 'font-size': tickPx, fill: TEXT_COLOUR });
  const ly = legendTop + 6;
  let lx = sidePx;
  const item = (draw: (x: number) => void, text: string) => {
    draw(lx + 6);
    doc.text(legend, text, { x: lx + 16, y: ly + tickPx * 0.35 });
    lx += 16 + textWidthPx(text, tickPx) + 14;
  };
  const dot = (fill: string) => (x: number) =>
    doc.element(legend, 'circle', { cx: x, cy: ly, r: 5, fill, 'fill-opacity': 0.85 });
  item(dot(ANCHOR), 'anchor (larger: more tension)');
  item(dot(GOVERNING), 'governing anchor');
  item((x) => doc.element(legend, 'path', massMark(x, ly, 6)), 'centre of mass');
  item((x) => doc.element(legend, 'path', centroidMark(x, ly)), 'anchor centroid');

  drawFooter(doc, footer);
  return doc.serialize();
}

/** The centre of mass: a plus sign `size` px from its centre to each end. */
function massMark(x: number, y: number, size: number) {
  return { d: `M${x - size},${y}H${x + size}M${x},${y - size}V${y + size}`, stroke: MASS, 'stroke-width': 2 };
}

/** The anchors' centroid: a small grey cross. */
function centroidMark(x: number, y: number) {
  return {
    d: `M${x - 4},${y - 4}L${x + 4},${y + 4}M${x - 4},${y + 4}L${x + 4},${y - 4}`,
    stroke: '#555555',
    'stroke-width': 1.2,
  };
}

function format(value: number): string {
  return Number(value.toPrecision(4)).toString();
}
