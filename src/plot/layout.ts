import { scaleLinear, scaleLog } from 'd3-scale';
import type { AxisScale, AxisSpec, PanelSpec, Series } from './panel.js';
import { FIGURE_TEXT, type SeriesStyle, seriesStyle } from './styles.js';
import {
  type AxisTicks,
  linearTicks,
  logTicks,
  niceCeilWithHeadroom,
  niceFloor125,
  textWidthPx,
} from './ticks.js';

const { tickPx } = FIGURE_TEXT;

/** A panel with its styles, scales and domains settled, before anything is drawn. */
export interface PanelLayout {
  spec: PanelSpec;
  series: { series: Series; style: SeriesStyle }[];
  xScale: AxisScale;
  yScale: AxisScale;
  /** The x extent in the data's units (periods on a frequency axis). */
  xDomain: readonly [number, number];
  /** The x extent along the axis: `xDomain`, or its reciprocal ascending on a reciprocal axis. */
  xAxisDomain: readonly [number, number];
  /** A data x as a value along the axis: itself, or 1/x on a reciprocal axis (f = 1/T). */
  toXAxis: (x: number) => number;
  yDomain: readonly [number, number];
  yTicks: AxisTicks;
  yLabelWidthPx: number;
}

/**
 * Settle a panel: each series' style, and the axis domains (the data's extent unless fixed; a log
 * y axis widened to round values with headroom at the top, a linear one made nice, symmetric about zero where asked for).
 */
export function layoutPanel(spec: PanelSpec): PanelLayout {
  const xScale = spec.x.scale ?? 'log';
  const yScale = spec.y.scale ?? 'log';
  const series = spec.series.map((s, i) => ({ series: s, style: { ...seriesStyle(i), ...s.style } }));
  const toXAxis = spec.x.reciprocal ? reciprocal : identity;
  const axes = { xScale, yScale, toXAxis };
  const xDomain = spec.x.domain ?? dataDomain(spec.series, 'x', axes);
  const yDomain = spec.y.domain ?? yAxisDomain(dataDomain(spec.series, 'y', axes), yScale, spec.y);
  const xAxisDomain: readonly [number, number] = spec.x.reciprocal
    ? [1 / Math.max(...xDomain), 1 / Math.min(...xDomain)]
    : xDomain;
  const yTicks = axisTicks(yScale, yDomain, spec.heightPx, 'y');
  const yLabelWidthPx = Math.max(0, ...yTicks.labels.map((l) => textWidthPx(l.text, tickPx)));
  return { spec, series, xScale, yScale, xDomain, xAxisDomain, toXAxis, yDomain, yTicks, yLabelWidthPx };
}

const identity = (x: number) => x;
/** Frequency f = 1/T of a period T (and back): 1/0 = ∞, which no axis draws. */
const reciprocal = (x: number) => 1 / x;

/**
 * A y axis over the data's extent: from a 1-2-5 value up to a round value with headroom above the
 * highest curve (log), made nice from 0 or about 0 (linear).
 */
function yAxisDomain([low, high]: [number, number], scale: AxisScale, axis: AxisSpec): [number, number] {
  if (scale === 'log') return [niceFloor125(low), niceCeilWithHeadroom(high)];
  const m = Math.max(Math.abs(low), Math.abs(high)) * 1.08 || 1;
  const extent = axis.symmetric ? [-m, m] : [Math.min(0, low), high * 1.04 || 1];
  return scaleLinear().domain(extent).nice().domain() as [number, number];
}

/** The extent of the drawable points of all series along one coordinate, in the data's units. */
function dataDomain(
  series: readonly Series[],
  axis: 'x' | 'y',
  { xScale, yScale, toXAxis }: { xScale: AxisScale; yScale: AxisScale; toXAxis: (x: number) => number },
): [number, number] {
  const scale = axis === 'x' ? xScale : yScale;
  let low = Number.POSITIVE_INFINITY;
  let high = Number.NEGATIVE_INFINITY;
  for (const s of series) {
    for (let i = 0; i < s.x.length; i++) {
      if (!drawable(toXAxis(s.x[i]), s.y[i], xScale, yScale)) continue;
      const v = axis === 'x' ? s.x[i] : s.y[i];
      low = Math.min(low, v);
      high = Math.max(high, v);
    }
  }
  if (!Number.isFinite(low)) return scale === 'log' ? [0.1, 1] : [0, 1];
  if (low === high) return scale === 'log' ? [low / 3, high * 3] : [low - 1, high + 1];
  return [low, high];
}

/** Whether a point can be drawn: finite, and positive on a log axis. */
export function drawable(x: number, y: number, xScale: AxisScale, yScale: AxisScale): boolean {
  if (!Number.isFinite(x) || !Number.isFinite(y)) return false;
  if (xScale === 'log' && x <= 0) return false;
  if (yScale === 'log' && y <= 0) return false;
  return true;
}

/** A d3 scale of the kind asked for. */
export function makeScale(kind: AxisScale, domain: readonly [number, number], range: [number, number]) {
  const scale = kind === 'log' ? scaleLog() : scaleLinear();
  return scale.domain(domain).range(range);
}

/** The ticks of one axis `lengthPx` long: log decades or linear steps whose labels do not collide. */
export function axisTicks(
  kind: AxisScale,
  domain: readonly [number, number],
  lengthPx: number,
  axis: 'x' | 'y',
): AxisTicks {
  const range: [number, number] = axis === 'x' ? [0, lengthPx] : [lengthPx, 0];
  const scale = makeScale(kind, domain, range);
  const extent = (text: string) => (axis === 'x' ? textWidthPx(text, tickPx) : tickPx * 1.3);
  return kind === 'log' ? logTicks(domain, scale, extent) : linearTicks(domain, scale, extent, lengthPx);
}
