export { type AnchorPlanInput, anchorPlanSvg } from './anchor-plan-figure.js';
export { type DampingFigureInput, dampingFigure } from './damping-figure.js';
export { type DesignFigureInput, designFigure } from './design-figure.js';
export {
  type DuctilityFigureOptions,
  type DuctilityReductionOptions,
  ductilityDemandSvg,
  ductilityFigures,
  ductilityReductionSvg,
  ductilityStrengthSvg,
  type NamedFigure,
} from './ductility-figure.js';
export { type FigureSpec, renderFigure } from './figure.js';
export { type FloorFigureInput, floorFigure } from './floor-figure.js';
export { type FloorSetFigureInput, floorSetFigure } from './floor-set-figure.js';
export { type FourierFigureInput, fourierFigure } from './fourier-figure.js';
export {
  type HistoriesFigureInput,
  type HistoriesFigureOptions,
  historiesFigure,
  peakIndex,
} from './histories-figure.js';
export { type HusidFigureInput, husidFigure } from './husid-figure.js';
export { type LineChartOptions, lineChart } from './line-chart.js';
export {
  type AxisScale,
  type AxisSpec,
  decimatedIndices,
  type PanelContext,
  type PanelSpec,
  type Series,
} from './panel.js';
export { PERIOD_AXES, type PeriodAxis, periodAxisSpec } from './period-axis.js';
export { type RotDFigureInput, rotdFigure } from './rotd-figure.js';
export {
  type PsaFigureOptions,
  type PsaOverlay,
  psaFigure,
  psvFigure,
  type SpectrumFigureOptions,
  sdFigure,
  spectrumSubtitle,
} from './spectrum-figure.js';
export { FIGURE_WIDTH_PX, overlayStyle, type SeriesStyle, seriesStyle } from './styles.js';
export { tripartiteFigure } from './tripartite-figure.js';
