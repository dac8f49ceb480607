import { lineChart } from './line-chart.js';
import type { Series } from './panel.js';
import { processingLines, recordNameLine } from './text.js';
import { niceCeil125, niceFloor125 } from './ticks.js';

export interface FourierFigureInput {
  /** The record's name and where it came from. */
  name: string;
  source?: string;
  frequenciesHz: ArrayLike<number>;
  /** Fourier amplitude, m/s, at `frequenciesHz`. */
  amplitudeMS: ArrayLike<number>;
  /** Smoothed amplitudes at `smoothedHz`, or none. */
  smoothedHz?: ArrayLike<number>;
  smoothedMS?: ArrayLike<number>;
  /** e.g. "Konno–Ohmachi 1998, b = 40". */
  smoothingLabel?: string;
  /** A note on where the smoothed curve is drawn, e.g. where it starts. */
  smoothingNote?: string;
  /** How the transform was taken, one line. */
  methodDescription?: string;
  processing?: readonly { description: string }[];
}

/** Decades of amplitude drawn below the largest: the rest is numerical noise at this scale. */
const AMPLITUDE_DECADES = 5;

/**
 * Fourier amplitude spectrum of the ground acceleration on log–log axes: the raw amplitudes thin
 * and grey, the smoothed ones (if given) over them. The axis keeps five decades below the peak.
 */
export function fourierFigure(input: FourierFigureInput): string {
  let peak = 0;
  for (let i = 0; i < input.amplitudeMS.length; i++)
    if (input.frequenciesHz[i] > 0 && input.amplitudeMS[i] > peak) peak = input.amplitudeMS[i];
  if (!(peak > 0)) peak = 1;
  const series: Series[] = [
    {
      label: 'unsmoothed',
      x: input.frequenciesHz,
      y: input.amplitudeMS,
      style: { color: '#9a9a9a', dash: 'none', widthPx: 0.7 },
      decimate: true,
    },
  ];
  if (input.smoothedHz !== undefined && input.smoothedMS !== undefined) {
    series.push({
      label: `smoothed (${input.smoothingLabel ?? 'smoothed'})`,
      x: input.smoothedHz,
      y: input.smoothedMS,
      style: { color: '#0072B2', dash: 'none', widthPx: 1.8 },
    });
  }
  const subtitle = [
    recordNameLine(input.name, input.source),
    ...processingLines(input.processing, 'Processed: nothing (as read)'),
  ];
  if (input.methodDescription !== undefined) subtitle.push(`Method: ${input.methodDescription}`);
  return lineChart({
    title: 'Fourier amplitude spectrum of the ground acceleration',
    subtitle,
    x: { title: 'Frequency f (Hz)' },
    y: {
      title: 'Fourier amplitude (m/s)',
      domain: [niceFloor125(peak * 10 ** -AMPLITUDE_DECADES), niceCeil125(peak * 1.2)],
    },
    heightPx: 320,
    series,
    notes: [
      `Amplitudes more than ${AMPLITUDE_DECADES} decades below the largest are cut off at the bottom of the plot; the unsmoothed line is drawn by the lowest and highest value of each pixel column.`,
      ...(input.smoothingNote !== undefined && input.smoothedHz !== undefined ? [input.smoothingNote] : []),
    ],
  });
}
