import { renderFigure } from './figure.js';
import type { AxisScale, PanelContext, Series } from './panel.js';

export interface LineChartOptions {
  x: { title: string; scale?: AxisScale; domain?: readonly [number, number] };
  y: { title: string; scale?: AxisScale; domain?: readonly [number, number] };
  series: readonly Series[];
  /** Scale of both axes unless an axis names its own; default 'log'. */
  axes?: AxisScale;
  title: string;
  subtitle?: readonly string[];
  notes?: readonly string[];
  legendTitle?: string;
  /** Height of the plotting area, px; default 360. */
  heightPx?: number;
  /** Drawn under the curves, over the grid. */
  underlay?: (context: PanelContext) => void;
  /** Drawn over the curves. */
  overlay?: (context: PanelContext) => void;
}

/**
 * One plot of several curves with its axes, legend, notes and the caution: the machinery under
 * every spectrum figure, and the one to use for new ones.
 *
 * @example
 * lineChart({ title: 'PSA', x: { title: 'Period T (s)' }, y: { title: 'PSA (g)' },
 *   series: [{ label: 'ζ = 5%', x: [0.1, 1], y: [0.8, 0.2] }] })
 */
export function lineChart(options: LineChartOptions): string {
  const axes = options.axes ?? 'log';
  return renderFigure({
    title: options.title,
    subtitle: options.subtitle,
    notes: options.notes,
    legendTitle: options.legendTitle,
    panels: [
      {
        heightPx: options.heightPx ?? 360,
        x: { ...options.x, scale: options.x.scale ?? axes },
        y: { ...options.y, scale: options.y.scale ?? axes },
        series: options.series,
        underlay: options.underlay,
        overlay: options.overlay,
      },
    ],
  });
}
