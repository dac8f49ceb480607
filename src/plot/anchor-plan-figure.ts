import { formatNumber } from '../base/numbers.js';
import { finishPage } from './footer.js';
import { startPage } from './header.js';
import { axisTicks, makeScale } from './layout.js';
import { drawAxisTitle, drawFrame, drawTickLabels } from './panel.js';
import { FIGURE_TEXT, FIGURE_WIDTH_PX, GRID_COLOUR, HALO, TEXT_COLOUR } from './styles.js';
import { textWidthPx } from './ticks.js';

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
/** The plan's square plot, px. */
const PLOT_PX = 400;
/** Font size of the labels on the plan, px. */
const LABEL_PX = 9.5;

/** A box on the page, px: left, top, right, bottom. */
type Box = [number, number, number, number];

/** The box of a one-line label of LABEL_PX starting at `left` with its baseline at `y`. */
function textBox(left: number, y: number, widthPx: number): Box {
  return [left, y - LABEL_PX * 0.8, left + widthPx, y + LABEL_PX * 0.25];
}

function boxesMeet(a: Box, b: Box, gapPx = 3): boolean {
  return a[0] < b[2] + gapPx && b[0] < a[2] + gapPx && a[1] < b[3] + gapPx && b[1] < a[3] + gapPx;
}

/**
 * Where the direction's label goes: beside the arrow's tip (past it, then above or below it, on the
 * arrow's side and then the other), the first place inside the frame that meets none of the
 * `taken` boxes (anchors and their labels, the centre of mass, the arrow); the first place when
 * none is free.
 */
export function directionLabelSpot(
  text: string,
  [tipX, tipY]: [number, number],
  [ux, uy]: [number, number],
  taken: readonly Box[],
  frame: Box,
): { x: number; y: number; anchor: 'start' | 'end' } {
  const width = textWidthPx(text, LABEL_PX);
  const ahead = ux >= 0 ? 'start' : 'end';
  const behind = ux >= 0 ? 'end' : 'start';
  const beyond = uy <= 0 ? -6 : 14;
  const offsets: [number, number, 'start' | 'end'][] = [
    [6, beyond, ahead],
    [6, beyond - 14, ahead],
    [6, beyond + 14, ahead],
    [-6, beyond, behind],
    [6, beyond - 28, ahead],
    [6, beyond + 28, ahead],
    [-6, beyond - 14, behind],
    [-6, beyond + 14, behind],
  ];
  const spots = offsets.map(([dx, dy, anchor]) => {
    const x0 = tipX + (ux >= 0 ? dx : -dx);
    const left = anchor === 'start' ? x0 : x0 - width;
    // Kept in the frame, as the label always was.
    const shift = Math.max(frame[0] + 4 - left, Math.min(0, frame[2] - 4 - (left + width)));
    const y = Math.min(frame[3] - 6, Math.max(frame[1] + 12, tipY + dy));
    return { x: x0 + shift, y, anchor, box: textBox(left + shift, y, width) };
  });
  const free = spots.find((s) => !taken.some((b) => boxesMeet(s.box, b)));
  const { x, y, anchor } = free ?? spots[0];
  return { x, y, anchor };
}

/**
 * Plan view of an anchor pattern as SVG text: each anchor with its worst tension (circle area in
 * proportion), the centre of mass, the anchors' centroid and an arrow for the direction of the
 * horizontal force that governs. Equal scales on x and y; the same header, fonts and caution footer
 * as the other figures, all text escaped by the document's serializer.
 */
export function anchorPlanSvg(input: AnchorPlanInput): string {
  const { tickPx, axisTitlePx, sidePx } = FIGURE_TEXT;
  const { page, bottom } = startPage(input.title, input.subtitle);
  const { doc } = page;

  const xs = [...input.anchors.map((a) => a.x), input.cgPlan[0], input.centroid[0]];
  const ys = [...input.anchors.map((a) => a.y), input.cgPlan[1], input.centroid[1]];
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const span = Math.max(maxX - minX, maxY - minY) || 1;
  const half = span / 2 + span * 0.3;
  const xDomain = [(minX + maxX) / 2 - half, (minX + maxX) / 2 + half] as const;
  const yDomain = [(minY + maxY) / 2 - half, (minY + maxY) / 2 + half] as const;
  const plot = { left: (FIGURE_WIDTH_PX - PLOT_PX) / 2, top: bottom + 16, width: PLOT_PX, height: PLOT_PX };
  const [plotRight, plotBottom] = [plot.left + PLOT_PX, plot.top + PLOT_PX];
  const legendTop = plotBottom + tickPx + 8 + axisTitlePx + 16;

  const px = makeScale('linear', xDomain, [plot.left, plotRight]);
  const py = makeScale('linear', yDomain, [plotBottom, plot.top]);
  const panel = doc.element(doc.root, 'g', { class: 'panel', 'data-panel': 0 });
  const xTicks = axisTicks('linear', xDomain, PLOT_PX, 'x');
  const yTicks = axisTicks('linear', yDomain, PLOT_PX, 'y');
  const grid = doc.element(panel, 'g', { class: 'grid', stroke: GRID_COLOUR, 'stroke-width': 0.6 });
  for (const v of xTicks.major)
    doc.element(grid, 'line', { x1: px(v), x2: px(v), y1: plot.top, y2: plotBottom });
  for (const v of yTicks.major)
    doc.element(grid, 'line', { x1: plot.left, x2: plotRight, y1: py(v), y2: py(v) });
  drawFrame(doc, panel, plot);
  const labels = doc.element(panel, 'g', { class: 'tick-labels', fill: TEXT_COLOUR, 'font-size': tickPx });
  drawTickLabels(doc, labels, 'x', xTicks, (v) => ({ x: px(v), y: plotBottom + 7 + tickPx }));
  drawTickLabels(doc, labels, 'y', yTicks, (v) => ({ x: plot.left - 6, y: py(v) + tickPx * 0.35 }));
  const xTitleY = plotBottom + 7 + tickPx + 6 + axisTitlePx;
  drawAxisTitle(doc, panel, 'x', `x (${input.lengthUnit})`, [plot.left + PLOT_PX / 2, xTitleY]);
  const yLabelWidth = Math.max(...yTicks.labels.map((l) => textWidthPx(l.text, tickPx)), 20);
  const yTitleAt: [number, number] = [plot.left - 6 - yLabelWidth - 10, plot.top + PLOT_PX / 2];
  drawAxisTitle(doc, panel, 'y', `y (${input.lengthUnit})`, yTitleAt);

  const marks = doc.element(panel, 'g', { class: 'plan' });
  // The governing direction: an arrow through the centre of mass, where the force acts.
  const [gx, gy] = [px(input.cgPlan[0]), py(input.cgPlan[1])];
  const rad = (input.directionDeg * Math.PI) / 180;
  const [ux, uy] = [Math.cos(rad), -Math.sin(rad)];
  const length = PLOT_PX * 0.3;
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
  // Each anchor's label centred above the anchors of the upper half, below those of the lower half,
  // kept in the frame; the direction's label then goes where it meets none of them.
  const maxTension = Math.max(...input.anchors.map((p) => p.tension), 0);
  const placed = input.anchors.map((p, i) => {
    const governing = i === input.governingAnchor && maxTension > 0;
    const r = 4 + (maxTension > 0 ? 8 * Math.sqrt(p.tension / maxTension) : 0);
    const [cx, cy] = [px(p.x), py(p.y)];
    const label = `${i + 1}: T = ${formatNumber(p.tension)} ${input.forceUnit}${governing ? ' (governs)' : ''}`;
    const halfWidth = textWidthPx(label, LABEL_PX) / 2;
    const x = Math.min(plotRight - halfWidth - 3, Math.max(plot.left + halfWidth + 3, cx));
    const y = cy + (p.y >= input.centroid[1] ? -r - 4 : r + 12);
    const boxes: Box[] = [textBox(x - halfWidth, y, 2 * halfWidth), [cx - r, cy - r, cx + r, cy + r]];
    return { p, i, governing, r, cx, cy, label, x, y, boxes };
  });
  const arrowText = `force direction ${input.directionDeg.toFixed(1)}°`;
  // The arrow's shaft, in short pieces, is taken too.
  const shaft = Array.from({ length: 15 }, (_, k): Box => {
    const t = -0.4 + (1.4 * k) / 14;
    const [sx, sy] = [gx + ux * length * t, gy + uy * length * t];
    return [sx - 2, sy - 2, sx + 2, sy + 2];
  });
  const taken = [...placed.flatMap((a) => a.boxes), [gx - 8, gy - 8, gx + 8, gy + 8] as Box, ...shaft];
  const spot = directionLabelSpot(arrowText, [tipX, tipY], [ux, uy], taken, [
    plot.left,
    plot.top,
    plotRight,
    plotBottom,
  ]);
  doc.text(arrow, arrowText, {
    x: spot.x,
    y: spot.y,
    'text-anchor': spot.anchor,
    'font-size': LABEL_PX,
    fill: GOVERNING,
    ...HALO,
  });

  for (const { p, i, governing, r, cx, cy, label, x, y } of placed) {
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
    doc.text(anchor, label, {
      x,
      y,
      'text-anchor': 'middle',
      'font-size': LABEL_PX,
      fill: TEXT_COLOUR,
      ...HALO,
    });
  }
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

  return finishPage(page, input.notes, legendTop + 20);
}

/** The centre of mass: a plus sign `size` px from its centre to each end. */
function massMark(x: number, y: number, size: number) {
  return { d: `M${x - size},${y}H${x + size}M${x},${y - size}V${y + size}`, stroke: MASS, 'stroke-width': 2 };
}

/** The anchors' centroid: a small grey cross. */
function centroidMark(x: number, y: number) {
  const d = `M${x - 4},${y - 4}L${x + 4},${y + 4}M${x - 4},${y + 4}L${x + 4},${y - 4}`;
  return { d, stroke: '#555555', 'stroke-width': 1.2 };
}
