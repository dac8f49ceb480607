import { scaleLinear, scaleLog } from 'd3-scale';
import { line } from 'd3-shape';
import { CAUTION } from '../base/caution.js';
import {
  FRAME_COLOUR,
  GRID_COLOUR,
  MINOR_GRID_COLOUR,
  type SeriesStyle,
  seriesStyle,
  TEXT_COLOUR,
} from './styles.js';
import { createSvgDocument, type SvgDocument } from './svg.js';
import { wrapText } from './text.js';
import { type AxisTicks, linearTicks, logTicks, niceCeil125, niceFloor125, textWidthPx } from './ticks.js';

/** Width of every figure: 640 px, 169 mm at 96 px to the inch, the text width of an A4 or letter page. */
export const FIGURE_WIDTH_PX = 640;

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

export interface FigureSpec {
  title: string;
  subtitle?: readonly string[];
  panels: readonly PanelSpec[];
  legendTitle?: string;
  /** Lines of small print above the caution (method notes, what is left off the plot). */
  notes?: readonly string[];
  widthPx?: number;
  /** Room right of the plots, px, e.g. for labels at the right end of lines; default 18. */
  rightMarginPx?: number;
}

/** Font sizes and side margin shared by every figure, px. */
export const FIGURE_TEXT = {
  titlePx: 13,
  subtitlePx: 10,
  tickPx: 10,
  axisTitlePx: 10.5,
  notePx: 8.5,
  footerPx: 8,
  sidePx: 14,
} as const;

const TITLE_PX = FIGURE_TEXT.titlePx;
const SUBTITLE_PX = FIGURE_TEXT.subtitlePx;
const TICK_PX = FIGURE_TEXT.tickPx;
const AXIS_TITLE_PX = FIGURE_TEXT.axisTitlePx;
const NOTE_PX = FIGURE_TEXT.notePx;
const FOOTER_PX = FIGURE_TEXT.footerPx;
const RIGHT_MARGIN_PX = 18;
const SIDE_PX = FIGURE_TEXT.sidePx;

interface PanelLayout {
  spec: PanelSpec;
  series: { series: Series; style: SeriesStyle }[];
  xScale: AxisScale;
  yScale: AxisScale;
  xDomain: [number, number];
  yDomain: [number, number];
  yLabelWidthPx: number;
}

/**
 * Draw a figure: title and subtitle, panels stacked on one page width, a legend, notes and the
 * standing caution as the footer. Returns standalone SVG text.
 */
export function renderFigure(spec: FigureSpec): string {
  const widthPx = spec.widthPx ?? FIGURE_WIDTH_PX;
  const layouts = spec.panels.map(layoutPanel);
  const yLabelWidth = Math.max(...layouts.map((l) => l.yLabelWidthPx), 20);
  const plotLeft = SIDE_PX + AXIS_TITLE_PX + 8 + yLabelWidth + 7;
  const plotWidth = widthPx - plotLeft - (spec.rightMarginPx ?? RIGHT_MARGIN_PX);
  const textWidth = widthPx - 2 * SIDE_PX;

  const titleLines = wrapText(spec.title, textWidth, TITLE_PX);
  const subtitleLines = (spec.subtitle ?? []).flatMap((s) => wrapText(s, textWidth, SUBTITLE_PX));
  const legendEntries = layouts.flatMap((l) => l.series.filter((s) => s.series.legend !== false));
  const legendRows = legendLayout(legendEntries, spec.legendTitle, plotWidth);
  const noteLines = (spec.notes ?? []).flatMap((n) => wrapText(n, textWidth, NOTE_PX));

  let y = 10;
  const titleTop = y;
  y += titleLines.length * (TITLE_PX + 4) + subtitleLines.length * (SUBTITLE_PX + 3) + 10;
  const panelTops: number[] = [];
  for (const layout of layouts) {
    y += layout.spec.gapAbovePx ?? 0;
    panelTops.push(y);
    y += layout.spec.heightPx + (layout.spec.xLabels === false ? 10 : TICK_PX + 8 + AXIS_TITLE_PX + 12);
  }
  const legendTop = y;
  if (legendRows.length > 0) y += legendRows.length * 16 + 6;
  const notesTop = y;
  y += noteLines.length * (NOTE_PX + 3);
  const footerTop = y + 6;
  y = footerTop + cautionHeightPx(widthPx);
  const heightPx = Math.ceil(y);

  const doc = createSvgDocument(widthPx, heightPx);
  doc.element(doc.root, 'title').textContent = spec.title;
  doc.element(doc.root, 'rect', { width: widthPx, height: heightPx, fill: '#ffffff' });
  const header = doc.element(doc.root, 'g', { class: 'header', fill: TEXT_COLOUR });
  let line = titleTop;
  for (const text of titleLines) {
    line += TITLE_PX + 2;
    doc.text(header, text, {
      x: SIDE_PX,
      y: line,
      'font-size': TITLE_PX,
      'font-weight': 'bold',
      class: 'title',
    });
    line += 2;
  }
  for (const text of subtitleLines) {
    line += SUBTITLE_PX + 3;
    doc.text(header, text, { x: SIDE_PX, y: line - 1, 'font-size': SUBTITLE_PX, class: 'subtitle' });
  }
  layouts.forEach((layout, i) => {
    drawPanel(
      doc,
      layout,
      { left: plotLeft, top: panelTops[i], width: plotWidth, height: layout.spec.heightPx },
      i,
    );
  });
  drawLegend(doc, legendRows, plotLeft, legendTop);
  const notes = doc.element(doc.root, 'g', { class: 'notes', fill: TEXT_COLOUR, 'font-size': NOTE_PX });
  noteLines.forEach((text, i) => {
    doc.text(notes, text, { x: SIDE_PX, y: notesTop + (i + 1) * (NOTE_PX + 3) - 2 });
  });
  drawCaution(doc, footerTop, widthPx);
  return doc.serialize();
}

/** Height of the caution footer of a figure `widthPx` wide, px, rule and margins included. */
export function cautionHeightPx(widthPx: number): number {
  return 6 + wrapText(CAUTION, widthPx - 2 * SIDE_PX, FOOTER_PX).length * (FOOTER_PX + 3) + 6;
}

/** The standing caution in small print under a rule at `top`, as every figure ends. */
export function drawCaution(doc: SvgDocument, top: number, widthPx: number): void {
  const footerLines = wrapText(CAUTION, widthPx - 2 * SIDE_PX, FOOTER_PX);
  const footer = doc.element(doc.root, 'g', { class: 'caution', fill: '#444444', 'font-size': FOOTER_PX });
  doc.element(footer, 'line', {
    x1: SIDE_PX,
    x2: widthPx - SIDE_PX,
    y1: top,
    y2: top,
    stroke: '#999999',
    'stroke-width': 0.6,
  });
  footerLines.forEach((text, i) => {
    doc.text(footer, text, { x: SIDE_PX, y: top + 4 + (i + 1) * (FOOTER_PX + 3) - 2 });
  });
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

function layoutPanel(spec: PanelSpec): PanelLayout {
  const xScale = spec.x.scale ?? 'log';
  const yScale = spec.y.scale ?? 'log';
  const series = spec.series.map((s, i) => ({ series: s, style: { ...seriesStyle(i), ...s.style } }));
  const xDomain = spec.x.domain
    ? ([...spec.x.domain] as [number, number])
    : dataDomain(spec.series, 'x', xScale, yScale);
  let yDomain = spec.y.domain
    ? ([...spec.y.domain] as [number, number])
    : dataDomain(spec.series, 'y', xScale, yScale);
  if (!spec.y.domain) {
    if (yScale === 'log') yDomain = [niceFloor125(yDomain[0]), niceCeil125(yDomain[1])];
    else if (spec.y.symmetric) {
      const m = Math.max(Math.abs(yDomain[0]), Math.abs(yDomain[1])) * 1.08 || 1;
      yDomain = scaleLinear().domain([-m, m]).nice().domain() as [number, number];
    } else {
      yDomain = scaleLinear()
        .domain([Math.min(0, yDomain[0]), yDomain[1] * 1.04 || 1])
        .nice()
        .domain() as [number, number];
    }
  }
  const ticks = axisTicks(yScale, yDomain, spec.heightPx, 'y');
  const yLabelWidthPx = Math.max(0, ...ticks.labels.map((l) => textWidthPx(l.text, TICK_PX)));
  return { spec, series, xScale, yScale, xDomain, yDomain, yLabelWidthPx };
}

/** The extent of the drawable points of all series along one coordinate. */
function dataDomain(
  series: readonly Series[],
  axis: 'x' | 'y',
  xScale: AxisScale,
  yScale: AxisScale,
): [number, number] {
  const scale = axis === 'x' ? xScale : yScale;
  let low = Number.POSITIVE_INFINITY;
  let high = Number.NEGATIVE_INFINITY;
  for (const s of series) {
    for (let i = 0; i < s.x.length; i++) {
      if (!drawable(s.x[i], s.y[i], xScale, yScale)) continue;
      const v = axis === 'x' ? s.x[i] : s.y[i];
      low = Math.min(low, v);
      high = Math.max(high, v);
    }
  }
  if (!Number.isFinite(low)) return scale === 'log' ? [0.1, 1] : [0, 1];
  if (low === high) return scale === 'log' ? [low / 3, high * 3] : [low - 1, high + 1];
  return [low, high];
}

function drawable(x: number, y: number, xScale: AxisScale, yScale: AxisScale): boolean {
  if (!Number.isFinite(x) || !Number.isFinite(y)) return false;
  if (xScale === 'log' && x <= 0) return false;
  if (yScale === 'log' && y <= 0) return false;
  return true;
}

function makeScale(kind: AxisScale, domain: readonly [number, number], range: [number, number]) {
  const scale = kind === 'log' ? scaleLog() : scaleLinear();
  return scale.domain(domain).range(range);
}

function axisTicks(
  kind: AxisScale,
  domain: readonly [number, number],
  lengthPx: number,
  axis: 'x' | 'y',
): AxisTicks {
  const range: [number, number] = axis === 'x' ? [0, lengthPx] : [lengthPx, 0];
  const scale = makeScale(kind, domain, range);
  const extent = (text: string) => (axis === 'x' ? textWidthPx(text, TICK_PX) : TICK_PX * 1.3);
  return kind === 'log'
    ? logTicks(domain, (v) => scale(v), extent)
    : linearTicks(domain, (v) => scale(v), extent, lengthPx);
}

function drawPanel(
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
  const labels = doc.element(group, 'g', { class: 'tick-labels', fill: TEXT_COLOUR, 'font-size': TICK_PX });
  const yLabels = doc.element(labels, 'g', { class: 'y-ticks', 'text-anchor': 'end' });
  for (const { value, text } of yTicks.labels)
    doc.text(yLabels, text, { x: plot.left - 7, y: y(value) + TICK_PX * 0.35, 'data-value': value });
  doc.text(group, spec.y.title, {
    class: 'axis-title y-title',
    transform: `translate(${SIDE_PX + AXIS_TITLE_PX}, ${plot.top + plot.height / 2}) rotate(-90)`,
    'text-anchor': 'middle',
    'font-size': AXIS_TITLE_PX,
    fill: TEXT_COLOUR,
  });
  if (spec.xLabels !== false) {
    const xLabels = doc.element(labels, 'g', { class: 'x-ticks', 'text-anchor': 'middle' });
    for (const { value, text } of xTicks.labels)
      doc.text(xLabels, text, { x: x(value), y: bottom + 7 + TICK_PX, 'data-value': value });
    doc.text(group, spec.x.title, {
      class: 'axis-title x-title',
      x: plot.left + plot.width / 2,
      y: bottom + 7 + TICK_PX + 6 + AXIS_TITLE_PX,
      'text-anchor': 'middle',
      'font-size': AXIS_TITLE_PX,
      fill: TEXT_COLOUR,
    });
  }
  if (spec.overlay) spec.overlay({ ...context, group: doc.element(group, 'g', { class: 'marks' }) });
}

interface LegendItem {
  label: string;
  style: SeriesStyle | undefined;
  offsetPx: number;
}

const SAMPLE_PX = 30;

function legendLayout(
  entries: { series: Series; style: SeriesStyle }[],
  title: string | undefined,
  widthPx: number,
): LegendItem[][] {
  if (entries.length === 0) return [];
  const rows: LegendItem[][] = [[]];
  let offset = 0;
  const add = (label: string, style: SeriesStyle | undefined) => {
    const width = (style ? SAMPLE_PX + 5 : 0) + textWidthPx(label, TICK_PX) + 16;
    if (offset > 0 && offset + width > widthPx) {
      rows.push([]);
      offset = 0;
    }
    rows[rows.length - 1].push({ label, style, offsetPx: offset });
    offset += width;
  };
  if (title !== undefined) add(title, undefined);
  for (const entry of entries) add(entry.series.label, entry.style);
  return rows;
}

function drawLegend(doc: SvgDocument, rows: LegendItem[][], left: number, top: number): void {
  if (rows.length === 0) return;
  const legend = doc.element(doc.root, 'g', { class: 'legend', 'font-size': TICK_PX, fill: TEXT_COLOUR });
  rows.forEach((row, r) => {
    const middle = top + r * 16 + 10;
    for (const item of row) {
      let textX = left + item.offsetPx;
      if (item.style) {
        doc.element(legend, 'line', {
          class: 'legend-sample',
          x1: textX,
          x2: textX + SAMPLE_PX,
          y1: middle,
          y2: middle,
          stroke: item.style.color,
          'stroke-width': item.style.widthPx,
          'stroke-dasharray': item.style.dash,
        });
        textX += SAMPLE_PX + 5;
      }
      doc.text(legend, item.label, { x: textX, y: middle + TICK_PX * 0.35 });
    }
  });
}
