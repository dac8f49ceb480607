import { formatNumber } from '../base/numbers.js';
import { INFO_METHODS } from '../formats/info.js';
import { logSpaced } from '../oscillator/grid.js';
import { type FourierFigureInput, fourierFigure } from '../plot/fourier-figure.js';
import { historiesFigure } from '../plot/histories-figure.js';
import { husidFigure } from '../plot/husid-figure.js';
import { fourierAmplitudeSpectrum, konnoOhmachiSmooth } from '../record/fourier.js';
import { integrateRecord } from '../record/integrate.js';
import { type GroundMotionMeasures, husidCurve } from '../record/measures.js';
import type { GroundRecord } from '../record/record.js';

/** Spectral lines the smoothing window's main lobe must hold for its average to mean anything. */
export const SMOOTHING_LINES = 3;

/**
 * The lowest centre frequency, Hz, at which the Konno–Ohmachi window of bandwidth b holds
 * SMOOTHING_LINES spectral lines `dfHz` apart in its main lobe, |b·log10(f/f_c)| < π, that is
 * f_c·(10^(π/b) − 10^(−π/b)) = SMOOTHING_LINES·Δf (Konno and Ohmachi 1998, eq. 4; the count of
 * lines is common practice). Below it the smoothed value is that of the nearest line alone: the
 * curve steps from line to line.
 */
export function smoothingStartHz(dfHz: number, bandwidth: number): number {
  const lobe = 10 ** (Math.PI / bandwidth) - 10 ** (-Math.PI / bandwidth);
  return (SMOOTHING_LINES * dfHz) / lobe;
}

/**
 * The figures of `quakesweep info` by file name: histories.svg, husid.svg and fourier.svg, the
 * Fourier amplitudes smoothed by Konno–Ohmachi with bandwidth `smoothingB` unless it is null,
 * from `smoothingStartHz` up.
 */
export function recordFigures(
  record: GroundRecord,
  m: GroundMotionMeasures,
  smoothingB: number | null,
): [string, string][] {
  const fas = fourierAmplitudeSpectrum(record.accelMS2, record.dtS);
  let smoothed: Partial<FourierFigureInput> = {};
  if (smoothingB !== null) {
    const dfHz = fas.frequenciesHz[1];
    const fHigh = fas.frequenciesHz[fas.frequenciesHz.length - 1];
    const fLow = Math.min(fHigh / 2, Math.max(dfHz, smoothingStartHz(dfHz, smoothingB)));
    const count = Math.max(2, Math.ceil(60 * Math.log10(fHigh / fLow)));
    const centresHz = Float64Array.from(logSpaced(fLow, fHigh, count));
    smoothed = {
      smoothedHz: centresHz,
      smoothedMS: konnoOhmachiSmooth(fas.frequenciesHz, fas.amplitudeMS, {
        bandwidth: smoothingB,
        centresHz,
      }),
      smoothingLabel: `Konno–Ohmachi 1998, b = ${smoothingB}`,
      smoothingNote: `The smoothed curve starts at ${formatNumber(fLow, 2)} Hz: below it the window's main lobe holds fewer than ${SMOOTHING_LINES} spectral lines (spacing ${formatNumber(dfHz, 3)} Hz), and its average is one line's value, a staircase.`,
    };
  }
  const histories = { ...integrateRecord(record), integrationDescription: INFO_METHODS.integration };
  const husid = husidCurve(record.accelMS2, record.dtS);
  const fourierMethod = `FFT of ${fas.transformLength} points (zero-padded), amplitude = Δt·|DFT|`;
  return [
    ['histories.svg', historiesFigure({ ...record, ...histories }, { lengthUnit: 'm' })],
    ['husid.svg', husidFigure({ ...record, husid, t5S: m.t5S, t75S: m.t75S, t95S: m.t95S })],
    ['fourier.svg', fourierFigure({ ...record, ...fas, ...smoothed, methodDescription: fourierMethod })],
  ];
}
