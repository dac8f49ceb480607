import { line } from 'd3-shape';
import { axisTicks, drawable, makeScale, type PanelLayout } from './layout.js';
import {
  FIGURE_TEXT,
  FRAME_COLOUR,
  GRID_COLOUR,
  MINOR_GRID_COLOUR,
  type SeriesStyle,
  TEXT_COLOUR,
} from './styles.js';
import type { SvgDocument } from './svg.js';

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

/** What a panel's decorations draw with. */
export interface PanelContext {
  doc: SvgDocument;
  group: SVGElement;
  x: (value: number) => number;
  y: (value: number) => number;
  xDomain: readonly [number, number];
  yDomain: readonly [number, number];
  xScale: AxisScale;
  yScale: AxisScale;
  plot: { left: number; top: number; width: number; height: number };
}

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
export function drawPanel(
  doc: SvgDocument,
  layout: PanelLayout,
  plot: { left: number; top: number; width: number; height: number },
  index: number,
): void {
  const { spec } = layout;
  const x = makeScale(layout.xScale, layout.xDomain, [plot.left, plot.left + plot.width]);
  const y = makeScale(layout.yScale, layout.yDomain, [plot.top + plot.height, plot.top]);
  const group = doc.element(doc.root, 'g', { class: 'panel', 'data-panel': index });
  const context: PanelContext = {
    doc,
    group,
    x: (v) => x(v),
    y: (v) => y(v),
    xDomain: layout.xDomain,
    yDomain: layout.yDomain,
    xScale: layout.xScale,
    yScale: layout.yScale,
    plot,
  };
  const xTicks = axisTicks(layout.xScale, layout.xDomain, plot.width, 'x');
  const yTicks = axisTicks(layout.yScale, layout.yDomain, plot.height, 'y');
  const bottom = plot.top + plot.height;
  const right = plot.left + plot.width;

  const grid = doc.element(group, 'g', { class: 'grid', fill: 'none' });
  for (const v of xTicks.minor)
    doc.element(grid, 'line', { x1: x(v), x2: x(v), y1: plot.top, y2: bottom, stroke: MINOR_GRID_COLOUR });
  for (const v of yTicks.minor)
    doc.element(grid, 'line', { x1: plot.left, x2: right, y1: y(v), y2: y(v), stroke: MINOR_GRID_COLOUR });
  for (const v of xTicks.major)
    doc.element(grid, 'line', { x1: x(v), x2: x(v), y1: plot.top, y2: bottom, stroke: GRID_COLOUR });
  for (const v of yTicks.major)
    doc.element(grid, 'line', { x1: plot.left, x2: right, y1: y(v), y2: y(v), stroke: GRID_COLOUR });

  const clipId = `plot-area-${index}`;
  const clip = doc.element(doc.element(group, 'defs'), 'clipPath', { id: clipId });
  doc.element(clip, 'rect', { x: plot.left, y: plot.top, width: plot.width, height: plot.height });
  if (spec.underlay) {
    const under = doc.element(group, 'g', { class: 'underlay', 'clip-path': `url(#${clipId})` });
    spec.underlay({ ...context, group: under });
  }
  const curves = doc.element(group, 'g', { class: 'curves', fill: 'none', 'clip-path': `url(#${clipId})` });
  for (const { series, style } of layout.series) {
    const count = Math.min(series.x.length, series.y.length);
    const canDraw = (i: number) => drawable(series.x[i], series.y[i], layout.xScale, layout.yScale);
    const indices = series.decimate
      ? decimatedIndices(
          count,
          (i) => x(series.x[i]),
          (i) => series.y[i],
          canDraw,
        )
      : Array.from({ length: count }, (_, i) => i);
    const path = line<number>()
      .defined(canDraw)
      .x((i) => x(series.x[i]))
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
  }
  doc.element(group, 'rect', {
    class: 'frame',
    x: plot.left,
    y: plot.top,
    width: plot.width,
    height: plot.height,
    fill: 'none',
    stroke: FRAME_COLOUR,
    'stroke-width': 0.8,
  });

  const axes = doc.element(group, 'g', { class: 'axes', stroke: FRAME_COLOUR, 'stroke-width': 0.8 });
  for (const v of xTicks.minor) doc.element(axes, 'line', { x1: x(v), x2: x(v), y1: bottom, y2: bottom + 3 });
  for (const v of xTicks.major) doc.element(axes, 'line', { x1: x(v), x2: x(v), y1: bottom, y2: bottom + 5 });
  for (const v of yTicks.minor)
    doc.element(axes, 'line', { x1: plot.left - 3, x2: plot.left, y1: y(v), y2: y(v) });
  for (const v of yTicks.major)
    doc.element(axes, 'line', { x1: plot.left - 5, x2: plot.left, y1: y(v), y2: y(v) });
  const labels = doc.element(group, 'g', { class: 'tick-labels', fill: TEXT_COLOUR, 'font-size': tickPx });
  const yLabels = doc.element(labels, 'g', { class: 'y-ticks', 'text-anchor': 'end' });
  for (const { value, text } of yTicks.labels)
    doc.text(yLabels, text, { x: plot.left - 7, y: y(value) + tickPx * 0.35, 'data-value': value });
  doc.text(group, spec.y.title, {
    class: 'axis-title y-title',
    transform: `translate(${sidePx + axisTitlePx}, ${plot.top + plot.height / 2}) rotate(-90)`,
    'text-anchor': 'middle',
    'font-size': axisTitlePx,
    fill: TEXT_COLOUR,
  });
  if (spec.xLabels !== false) {
    const xLabels = doc.element(labels, 'g', { class: 'x-ticks', 'text-anchor': 'middle' });
    for (const { value, text } of xTicks.labels)
      doc.text(xLabels, text, { x: x(value), y: bottom + 7 + tickPx, 'data-value': value });
    doc.text(group, spec.x.title, {
      class: 'axis-title x-title',
      x: plot.left + plot.width / 2,
      y: bottom + 7 + tickPx + 6 + axisTitlePx,
      'text-anchor': 'middle',
      'font-size': axisTitlePx,
      fill: TEXT_COLOUR,
    });
  }
  if (spec.overlay) spec.overlay({ ...context, group: doc.element(group, 'g', { class: 'marks' }) });
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
