import { formatNumber } from '../base/numbers.js';
import { LENGTH_UNITS, type LengthUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { renderFigure } from './figure.js';
import type { PanelContext, PanelSpec } from './panel.js';
import { TEXT_COLOUR } from './styles.js';
import { formatValue, processingLines, recordNameLine } from './text.js';

export interface HistoriesFigureInput {
  /** The record's name, for the title line. */
  name: string;
  /** Where it came from (path or description). */
  source?: string;
  dtS: number;
  /** Ground acceleration, m/s². */
  accelMS2: ArrayLike<number>;
  /** Ground velocity, m/s, at the same times (integrated by the caller, e.g. with integrateRecord). */
  velocityMS: ArrayLike<number>;
  /** Ground displacement, m, at the same times. */
  displacementM: ArrayLike<number>;
  /** How velocity and displacement were obtained, for the subtitle; default the trapezoidal rule from rest. */
  integrationDescription?: string;
  /** What was done to the record, one line each. */
  processing?: readonly { description: string }[];
}

export interface HistoriesFigureOptions {
  /** Unit of velocity and displacement; default m. */
  lengthUnit?: LengthUnit;
}

/**
 * Ground acceleration (g), velocity and displacement stacked on one time axis, each peak marked and
 * labelled. The histories are given (the plot module does no integration); long ones are drawn
 * with one low and one high point per pixel column, which keeps every peak exactly.
 */
export function historiesFigure(input: HistoriesFigureInput, options: HistoriesFigureOptions = {}): string {
  const unit = options.lengthUnit ?? 'm';
  const perLength = 1 / LENGTH_UNITS[unit];
  const n = input.accelMS2.length;
  if (input.velocityMS.length !== n || input.displacementM.length !== n) {
    throw new RangeError('acceleration, velocity and displacement must have the same number of samples');
  }
  const timesS = Float64Array.from({ length: n }, (_, i) => i * input.dtS);
  const durationS = n > 1 ? timesS[n - 1] : input.dtS;
  const scaled = (values: ArrayLike<number>, factor: number) => Float64Array.from(values, (v) => v * factor);
  const perG = 1 / STANDARD_GRAVITY_MS2;
  const rows = [
    { name: 'Acceleration', unit: 'g', values: scaled(input.accelMS2, perG), color: '#0072B2' },
    { name: 'Velocity', unit: `${unit}/s`, values: scaled(input.velocityMS, perLength), color: '#D55E00' },
    { name: 'Displacement', unit, values: scaled(input.displacementM, perLength), color: '#009E73' },
  ];
  const panels = rows.map((row, i): PanelSpec => {
    const title = `${row.name} (${row.unit})`;
    const style = { color: row.color, dash: 'none', widthPx: 1 };
    return {
      heightPx: 126,
      gapAbovePx: 14,
      x: { title: 'Time t (s)', scale: 'linear', domain: [0, durationS] },
      y: { title, scale: 'linear', symmetric: true },
      series: [
        { label: title, x: timesS, y: row.values, style, legend: false, kind: 'history', decimate: true },
      ],
      xLabels: i === rows.length - 1,
      overlay: (context) => markPeak(context, timesS, row.values, row.unit),
    };
  });
  const subtitle = [
    `${recordNameLine(input.name, input.source)}; ${n} samples at Δt = ${formatNumber(input.dtS, 6)} s`,
    ...processingLines(input.processing),
    `Method: ${input.integrationDescription ?? 'velocity and displacement by the trapezoidal rule from rest (v = u = 0 at t = 0)'}`,
  ];
  return renderFigure({
    title: 'Ground acceleration, velocity and displacement',
    subtitle,
    panels,
    notes: [
      ...(n > 1000
        ? [
            `The ${n} samples are drawn by the first, lowest, highest and last of each pixel column; the peaks marked are the exact sample peaks.`,
          ]
        : []),
      'No baseline correction is made here beyond the processing listed above; drift in the displacement usually shows an offset or long-period noise in the record.',
    ],
  });
}

function markPeak(context: PanelContext, timesS: Float64Array, values: Float64Array, unit: string): void {
  const { doc, group, x, y, plot } = context;
  const i = peakIndex(values);
  const mark = doc.element(group, 'g', { class: 'peak', 'data-value': values[i], 'data-time': timesS[i] });
  const ring = (cx: number, cy: number) =>
    doc.element(mark, 'circle', { cx, cy, r: 3.2, fill: 'none', stroke: TEXT_COLOUR, 'stroke-width': 1.2 });
  ring(x(timesS[i]), y(values[i]));
  const text = `peak ${formatValue(values[i])} ${unit} at t = ${formatValue(timesS[i])} s`;
  // Above the frame, right-aligned, where no curve can run under it; the marker sits on the curve.
  const right = plot.left + plot.width;
  doc.text(mark, text, {
    x: right - 10,
    y: plot.top - 4,
    'text-anchor': 'end',
    'font-size': 9.5,
    fill: TEXT_COLOUR,
  });
  ring(right - 4, plot.top - 7.5);
}

/** Index of the largest absolute value (the first one, if it repeats). */
export function peakIndex(values: ArrayLike<number>): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if (Math.abs(values[i]) > Math.abs(values[best])) best = i;
  return best;
}
