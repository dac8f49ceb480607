import { scaleLog } from 'd3-scale';
import { plotBottom, plotLeft, plotRight, plotTop, renderChart, shortNumber } from './simple-chart.js';

export interface FourierFigure {
  recordName: string;
  frequenciesHz: Float64Array;
  amplitudeMS: Float64Array;
  /** Smoothed amplitudes at `smoothedHz`, or none. */
  smoothedHz?: Float64Array;
  smoothedMS?: Float64Array;
  /** e.g. "Konno–Ohmachi, b = 40". */
  smoothingLabel?: string;
  notes?: string[];
}

/** Fourier amplitude spectrum on log–log axes: raw in grey, smoothed (if given) in dark blue. */
export function fourierSvg(figure: FourierFigure): string {
  const positive = (f: number, a: number) => f > 0 && a > 0 && Number.isFinite(a);
  const fx: number[] = [];
  const ay: number[] = [];
  for (let i = 0; i < figure.frequenciesHz.length; i++) {
    if (positive(figure.frequenciesHz[i], figure.amplitudeMS[i])) {
      fx.push(figure.frequenciesHz[i]);
      ay.push(figure.amplitudeMS[i]);
    }
  }
  const fMin = fx.length > 0 ? fx[0] : 0.01;
  const fMax = fx.length > 0 ? fx[fx.length - 1] : 100;
  const aMax = ay.length > 0 ? Math.max(...ay) : 1;
  const aMin = aMax * 1e-5;
  const x = scaleLog()
    .domain([fMin, Math.max(fMax, fMin * 10)])
    .range([plotLeft, plotRight]);
  const y = scaleLog()
    .domain([aMin, aMax * 2])
    .range([plotBottom, plotTop])
    .clamp(true);
  const series = [{ x: fx, y: ay, stroke: '#a6a6a6', width: 0.8 }];
  const notes = [...(figure.notes ?? [])];
  if (figure.smoothedHz !== undefined && figure.smoothedMS !== undefined) {
    const sx: number[] = [];
    const sy: number[] = [];
    for (let i = 0; i < figure.smoothedHz.length; i++) {
      if (positive(figure.smoothedHz[i], figure.smoothedMS[i])) {
        sx.push(figure.smoothedHz[i]);
        sy.push(figure.smoothedMS[i]);
      }
    }
    series.push({ x: sx, y: sy, stroke: '#1f4e79', width: 1.6 });
    notes.unshift(`grey: unsmoothed; blue: smoothed (${figure.smoothingLabel ?? 'smoothed'})`);
  }
  const logTick = (v: number) =>
    Number.isInteger(Math.log10(v) + 1e-9) || Math.abs(Math.log10(v) - Math.round(Math.log10(v))) < 1e-9
      ? shortNumber(v)
      : '';
  return renderChart({
    title: `Fourier amplitude spectrum: ${figure.recordName}`,
    xLabel: 'frequency, Hz',
    yLabel: 'Fourier amplitude, m/s',
    x,
    y,
    series,
    notes,
    tickFormat: { x: logTick, y: logTick },
  });
}
