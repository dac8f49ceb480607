import { line } from 'd3-shape';
import { axisTicks, drawable, makeScale, type PanelLayout } from './layout.js';
import {
  FIGURE_TEXT,
  FRAME_COLOUR,
  GRID_COLOUR,
  MARKER_RADIUS_PX,
  MARKER_SPACING_PX,
  MINOR_GRID_COLOUR,
  type SeriesStyle,
  TEXT_COLOUR,
} from './styles.js';
import type { SvgDocument } from './svg.js';
import type { AxisTicks } from './ticks.js';

const { tickPx, axisTitlePx, sidePx } = FIGURE_TEXT;

export type AxisScale = 'log' | 'linear';

export interface AxisSpec {
  /** Axis title with its unit, e.g. "Period T (s)". */
  title: string;
  /** Default 'log'. */
  scale?: AxisScale;
  /** Fixed domain; by default the data's extent (log: y widened to 1-2-5 values). */
  domain?: readonly [number, number];
  /** Linear axes only: make the domain symmetric about zero (time histories). */
  symmetric?: boolean;
  /**
   * x axes only: draw the reciprocal of the data, e.g. frequency f = 1/T of series given by period
   * T. The ticks are of 1/x (ascending to the right); `domain`, and the panel context's `x` and
   * `xDomain`, stay in the data's units; x = 0 (f = ∞) cannot be drawn and is left out.
   */
  reciprocal?: boolean;
}

/** One curve: points (x[i], y[i]); points that cannot be drawn on a log axis (≤ 0) are left out. */
export interface Series {
  label: string;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
  /** Default: the next data style (colour and dash) in the panel. */
  style?: Partial<SeriesStyle>;
  /** Whether the series appears in the legend; default true. */
  legend?: boolean;
  /** A class name on the curve's path, e.g. 'curve' or 'overlay'. Default 'curve'. */
  kind?: string;
  /**
   * Draw only the first, lowest, highest and last point of each pixel column (x ascending), for
   * long sampled histories: the drawn envelope and every peak are kept exactly, the file stays small.
   */
  decimate?: boolean;
}

/** Where a plot's frame stands on the page, px. */
export interface PlotBox {
  left: number;
  top: number;
  width: number;
  height: number;
}

/**
 * What a panel's decorations draw with: its spec, its settled axes, its scales and its frame; `x`
 * and `xDomain` are in the data's units (periods on a reciprocal, frequency, axis).
 */
export type PanelContext = Pick<PanelLayout, 'spec' | 'xScale' | 'yScale' | 'xDomain' | 'yDomain'> & {
  doc: SvgDocument;
  group: SVGElement;
  x: (value: number) => number;
  y: (value: number) => number;
  plot: PlotBox;
};

export interface PanelSpec {
  heightPx: number;
  /** Extra room above the frame, px, e.g. for a caption line over the panel; default 0. */
  gapAbovePx?: number;
  x: AxisSpec;
  y: AxisSpec;
  series: readonly Series[];
  /** Tick labels and title of the x axis under this panel; default true. Off for stacked panels. */
  xLabels?: boolean;
  /** Drawn over the grid and under the curves (e.g. the diagonal grids of a four-way plot). */
  underlay?: (context: PanelContext) => void;
  /** Drawn over the curves (e.g. peak marks). */
  overlay?: (context: PanelContext) => void;
}

/** Draw one panel in its frame: grid, underlay, curves, frame, ticks, axis titles, overlay. */
export function drawPanel(doc: SvgDocument, layout: PanelLayout, plot: PlotBox, index: number): void {
  const { spec, xScale, yScale, xDomain, yDomain, yTicks, xAxisDomain, toXAxis } = layout;
  // xAxis places values of the axis (its ticks), x places the data (the two differ when reciprocal).
  const xAxis = makeScale(xScale, xAxisDomain, [plot.left, plot.left + plot.width]);
  const x = spec.x.reciprocal ? (v: number) => xAxis(toXAxis(v)) : xAxis;
  const y = makeScale(yScale, yDomain, [plot.top + plot.height, plot.top]);
  const group = doc.element(doc.root, 'g', { class: 'panel', 'data-panel': index });
  const context: PanelContext = { doc, group, spec, x, y, xDomain, yDomain, xScale, yScale, plot };
  const xTicks = axisTicks(xScale, xAxisDomain, plot.width, 'x');
  const bottom = plot.top + plot.height;
  const right = plot.left + plot.width;
  const vertical = (parent: Element, v: number, y1: number, y2: number, stroke?: string) =>
    doc.element(parent, 'line', { x1: xAxis(v), x2: xAxis(v), y1, y2, stroke });
  const horizontal = (parent: Element, v: number, x1: number, x2: number, stroke?: string) =>
    doc.element(parent, 'line', { x1, x2, y1: y(v), y2: y(v), stroke });

  const grid = doc.element(group, 'g', { class: 'grid', fill: 'none' });
  for (const v of xTicks.minor) vertical(grid, v, plot.top, bottom, MINOR_GRID_COLOUR);
  for (const v of yTicks.minor) horizontal(grid, v, plot.left, right, MINOR_GRID_COLOUR);
  for (const v of xTicks.major) vertical(grid, v, plot.top, bottom, GRID_COLOUR);
  for (const v of yTicks.major) horizontal(grid, v, plot.left, right, GRID_COLOUR);

  const clipId = `plot-area-${index}`;
  const clip = doc.element(doc.element(group, 'defs'), 'clipPath', { id: clipId });
  doc.element(clip, 'rect', boxAttributes(plot));
  if (spec.underlay) {
    const under = doc.element(group, 'g', { class: 'underlay', 'clip-path': `url(#${clipId})` });
    spec.underlay({ ...context, group: under });
  }
  const curves = doc.element(group, 'g', { class: 'curves', fill: 'none', 'clip-path': `url(#${clipId})` });
  for (const { series, style } of layout.series) {
    const count = Math.min(series.x.length, series.y.length);
    const canDraw = (i: number) => drawable(toXAxis(series.x[i]), series.y[i], xScale, yScale);
    const column = (i: number) => x(series.x[i]);
    const indices = series.decimate
      ? decimatedIndices(count, column, (i) => series.y[i], canDraw)
      : Array.from({ length: count }, (_, i) => i);
    const path = line<number>()
      .defined(canDraw)
      .x(column)
      .y((i) => y(series.y[i]))
      .digits(2)(indices);
    doc.element(curves, 'path', {
      class: series.kind ?? 'curve',
      'data-label': series.label,
      d: path ?? '',
      stroke: style.color,
      'stroke-width': style.widthPx,
      'stroke-dasharray': style.dash,
      'stroke-linejoin': 'round',
    });
    if (style.marker) {
      const points = indices.filter(canDraw).map((i): [number, number] => [column(i), y(series.y[i])]);
      drawMarkers(doc, curves, style, spacedPoints(points, MARKER_SPACING_PX));
    }
  }
  drawFrame(doc, group, plot);

  const axes = doc.element(group, 'g', { class: 'axes', stroke: FRAME_COLOUR, 'stroke-width': 0.8 });
  for (const v of xTicks.minor) vertical(axes, v, bottom, bottom + 3);
  for (const v of xTicks.major) vertical(axes, v, bottom, bottom + 5);
  for (const v of yTicks.minor) horizontal(axes, v, plot.left - 3, plot.left);
  for (const v of yTicks.major) horizontal(axes, v, plot.left - 5, plot.left);
  const labels = doc.element(group, 'g', { class: 'tick-labels', fill: TEXT_COLOUR, 'font-size': tickPx });
  drawTickLabels(doc, labels, 'y', yTicks, (v) => ({ x: plot.left - 7, y: y(v) + tickPx * 0.35 }));
  drawAxisTitle(doc, group, 'y', spec.y.title, [sidePx + axisTitlePx, plot.top + plot.height / 2]);
  if (spec.xLabels !== false) {
    drawTickLabels(doc, labels, 'x', xTicks, (v) => ({ x: xAxis(v), y: bottom + 7 + tickPx }));
    drawAxisTitle(doc, group, 'x', spec.x.title, [
      plot.left + plot.width / 2,
      bottom + 7 + tickPx + 6 + axisTitlePx,
    ]);
  }
  if (spec.overlay) spec.overlay({ ...context, group: doc.element(group, 'g', { class: 'marks' }) });
}

/** Points of a curve, px, no two consecutive ones closer than `spacingPx` (the first always kept). */
export function spacedPoints(points: readonly [number, number][], spacingPx: number): [number, number][] {
  const out: [number, number][] = [];
  for (const p of points) {
    const last = out[out.length - 1];
    if (!last || Math.hypot(p[0] - last[0], p[1] - last[1]) >= spacingPx) out.push(p);
  }
  return out;
}

/** Hollow markers of a style at points, px (white-filled, so they read over grid and curves). */
export function drawMarkers(
  doc: SvgDocument,
  parent: Element,
  style: SeriesStyle,
  points: readonly [number, number][],
): void {
  const group = doc.element(parent, 'g', {
    class: 'markers',
    fill: '#ffffff',
    stroke: style.color,
    'stroke-width': 1.1,
  });
  const r = MARKER_RADIUS_PX;
  for (const [cx, cy] of points) {
    if (style.marker === 'square')
      doc.element(group, 'rect', { x: cx - r, y: cy - r, width: 2 * r, height: 2 * r });
    else doc.element(group, 'circle', { cx, cy, r });
  }
}

/** A plot's frame as the attributes of an SVG rect. */
function boxAttributes({ left, top, width, height }: PlotBox) {
  return { x: left, y: top, width, height };
}

/** A plot's frame. */
export function drawFrame(doc: SvgDocument, parent: Element, plot: PlotBox): void {
  const stroke = { fill: 'none', stroke: FRAME_COLOUR, 'stroke-width': 0.8 };
  doc.element(parent, 'rect', { class: 'frame', ...boxAttributes(plot), ...stroke });
}

/** The labels of an axis' ticks, each placed by `at` (x labels centred, y labels ending there). */
export function drawTickLabels(
  doc: SvgDocument,
  parent: Element,
  axis: 'x' | 'y',
  ticks: AxisTicks,
  at: (value: number) => { x: number; y: number },
): void {
  const anchor = axis === 'x' ? 'middle' : 'end';
  const group = doc.element(parent, 'g', { class: `${axis}-ticks`, 'text-anchor': anchor });
  for (const { value, text } of ticks.labels) doc.text(group, text, { ...at(value), 'data-value': value });
}

/** An axis title centred at `at`: under the plot (x), or turned up its left side (y). */
export function drawAxisTitle(
  doc: SvgDocument,
  parent: Element,
  axis: 'x' | 'y',
  title: string,
  [x, y]: [number, number],
): void {
  const place = axis === 'x' ? { x, y } : { transform: `translate(${x}, ${y}) rotate(-90)` };
  const font = { 'text-anchor': 'middle', 'font-size': axisTitlePx, fill: TEXT_COLOUR };
  doc.text(parent, title, { class: `axis-title ${axis}-title`, ...place, ...font });
}

/**
 * The indices of a series to draw when it is decimated: in each pixel column (x ascending) its
 * first, lowest, highest and last point, in order; points that cannot be drawn are kept as breaks.
 * The polyline through them covers the same pixels as the full one to within a column, and the
 * largest and smallest values are among them exactly (common practice for drawing long signals).
 */
export function decimatedIndices(
  count: number,
  toPixelX: (i: number) => number,
  value: (i: number) => number,
  drawable: (i: number) => boolean,
): number[] {
  const out: number[] = [];
  let column = Number.NaN;
  let first = -1;
  let last = -1;
  let low = -1;
  let high = -1;
  const flush = () => {
    if (first < 0) return;
    const picked = [...new Set([first, low, high, last])].sort((a, b) => a - b);
    out.push(...picked);
    first = -1;
  };
  for (let i = 0; i < count; i++) {
    if (!drawable(i)) {
      flush();
      out.push(i);
      column = Number.NaN;
      continue;
    }
    const c = Math.floor(toPixelX(i));
    if (c !== column) {
      flush();
      column = c;
      first = low = high = i;
    }
    last = i;
    if (value(i) < value(low)) low = i;
    if (value(i) > value(high)) high = i;
  }
  flush();
  return out;
}
