import { type FigureSpec, renderFigure } from './figure.js';
import type { AxisScale, PanelSpec } from './panel.js';

export interface LineChartOptions extends Omit<FigureSpec, 'panels'>, Omit<PanelSpec, 'heightPx'> {
  /** Scale of both axes unless an axis names its own; default 'log'. */
  axes?: AxisScale;
  /** Height of the plotting area, px; default 360. */
  heightPx?: number;
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
  const x = { ...options.x, scale: options.x.scale ?? axes };
  const y = { ...options.y, scale: options.y.scale ?? axes };
  // The options are the figure's and its one panel's at once.
  return renderFigure({ ...options, panels: [{ ...options, heightPx: options.heightPx ?? 360, x, y }] });
}
