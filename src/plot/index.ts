export { type AnchorPlanInput, anchorPlanSvg } from './anchor-plan.js';
export { type DampingFigureInput, dampingFigure } from './damping-figure.js';
export { type DesignFigureInput, designFigure } from './design-figure.js';
export {
  type AxisScale,
  type AxisSpec,
  decimatedIndices,
  FIGURE_WIDTH_PX,
  type FigureSpec,
  type PanelContext,
  type PanelSpec,
  renderFigure,
  type Series,
} from './figure.js';
export { type FloorFigureInput, floorFigure } from './floor-figure.js';
export { type FourierFigureInput, fourierFigure } from './fourier.js';
export {
  type HistoriesFigureInput,
  type HistoriesFigureOptions,
  historiesFigure,
  peakIndex,
} from './histories.js';
export { type HusidFigureInput, husidFigure } from './husid.js';
export { type LineChartOptions, lineChart } from './line-chart.js';
export { type RotDFigureInput, rotdFigure } from './rotd-figure.js';
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
