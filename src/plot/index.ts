export {
  type AxisScale,
  type AxisSpec,
  FIGURE_WIDTH_PX,
  type FigureSpec,
  type PanelContext,
  type PanelSpec,
  renderFigure,
  type Series,
} from './figure.js';
export {
  type HistoriesFigureInput,
  type HistoriesFigureOptions,
  historiesFigure,
  peakIndex,
} from './histories.js';
export { type LineChartOptions, lineChart } from './line-chart.js';
export {
  type PsaFigureOptions,
  type PsaOverlay,
  psaFigure,
  psvFigure,
  type SpectrumFigureOptions,
  sdFigure,
  spectrumSubtitle,
} from './spectrum-figures.js';
export { overlayStyle, type SeriesStyle, seriesStyle } from './styles.js';
export { tripartiteFigure } from './tripartite.js';
