import { INFO_METHODS } from '../formats/info.js';
import { logSpaced } from '../oscillator/grid.js';
import { type FourierFigureInput, fourierFigure } from '../plot/fourier-figure.js';
import { historiesFigure } from '../plot/histories-figure.js';
import { husidFigure } from '../plot/husid-figure.js';
import { fourierAmplitudeSpectrum, konnoOhmachiSmooth } from '../record/fourier.js';
import { integrateRecord } from '../record/integrate.js';
import { type GroundMotionMeasures, husidCurve } from '../record/measures.js';
import type { GroundRecord } from '../record/record.js';

/**
 * The figures of `quakesweep info` by file name: histories.svg, husid.svg and fourier.svg, the
 * Fourier amplitudes smoothed by Konno–Ohmachi with bandwidth `smoothingB` unless it is null.
 */
export function recordFigures(
  record: GroundRecord,
  m: GroundMotionMeasures,
  smoothingB: number | null,
): [string, string][] {
  const fas = fourierAmplitudeSpectrum(record.accelMS2, record.dtS);
  let smoothed: Partial<FourierFigureInput> = {};
  if (smoothingB !== null) {
    const fLow = fas.frequenciesHz[1];
    const fHigh = fas.frequenciesHz[fas.frequenciesHz.length - 1];
    const count = Math.max(2, Math.ceil(60 * Math.log10(fHigh / fLow)));
    const centresHz = Float64Array.from(logSpaced(fLow, fHigh, count));
    smoothed = {
      smoothedHz: centresHz,
      smoothedMS: konnoOhmachiSmooth(fas.frequenciesHz, fas.amplitudeMS, {
        bandwidth: smoothingB,
        centresHz,
      }),
      smoothingLabel: `Konno–Ohmachi 1998, b = ${smoothingB}`,
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
