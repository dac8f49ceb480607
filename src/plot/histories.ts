import { LENGTH_UNITS, type LengthUnit, STANDARD_GRAVITY_MS2 } from '../units.js';
import { type PanelContext, type PanelSpec, renderFigure } from './figure.js';
import { groundHistories, peakIndex } from './histories-data.js';
import { TEXT_COLOUR } from './styles.js';
import { formatValue } from './text.js';

export interface HistoriesFigureInput {
  /** The record's name, for the title line. */
  name: string;
  /** Where it came from (path or description). */
  source?: string;
  dtS: number;
  /** Ground acceleration, m/s². */
  accelMS2: ArrayLike<number>;
  /** What was done to the record, one line each. */
  processing?: readonly { description: string }[];
}

export interface HistoriesFigureOptions {
  /** Unit of velocity and displacement; default m. */
  lengthUnit?: LengthUnit;
}

/**
 * Ground acceleration (g), velocity and displacement stacked on one time axis, each peak marked and
 * labelled. Velocity and displacement are integrated from rest by the trapezoidal rule.
 */
export function historiesFigure(input: HistoriesFigureInput, options: HistoriesFigureOptions = {}): string {
  const unit = options.lengthUnit ?? 'm';
  const perLength = 1 / LENGTH_UNITS[unit];
  const h = groundHistories(input.accelMS2, input.dtS);
  const durationS = h.timesS[h.timesS.length - 1];
  const rows = [
    {
      title: 'Acceleration (g)',
      unit: 'g',
      values: h.accelMS2.map((v) => v / STANDARD_GRAVITY_MS2),
      color: '#0072B2',
    },
    {
      title: `Velocity (${unit}/s)`,
      unit: `${unit}/s`,
      values: h.velocityMS.map((v) => v * perLength),
      color: '#D55E00',
    },
    {
      title: `Displacement (${unit})`,
      unit,
      values: h.displacementM.map((v) => v * perLength),
      color: '#009E73',
    },
  ];
  const panels: PanelSpec[] = rows.map((row, i) => ({
    heightPx: 126,
    gapAbovePx: 14,
    x: { title: 'Time t (s)', scale: 'linear', domain: [0, durationS] },
    y: { title: row.title, scale: 'linear', symmetric: true },
    series: [
      {
        label: row.title,
        x: h.timesS,
        y: row.values,
        style: { color: row.color, dash: 'none', widthPx: 1 },
        legend: false,
        kind: 'history',
      },
    ],
    xLabels: i === rows.length - 1,
    overlay: (context) => markPeak(context, h.timesS, row.values, row.unit),
  }));
  const source = input.source !== undefined && input.source !== input.name ? ` (${input.source})` : '';
  const subtitle = [`Record: ${input.name}${source}; ${h.timesS.length} samples at Δt = ${input.dtS} s`];
  for (const step of input.processing ?? []) subtitle.push(`Processed: ${step.description}`);
  subtitle.push(
    'Method: velocity and displacement by the trapezoidal rule from rest (v = u = 0 at t = 0); no damping',
  );
  return renderFigure({
    title: 'Ground acceleration, velocity and displacement',
    subtitle,
    panels,
    notes: [
      'No baseline correction is made here beyond the processing listed above; drift in the displacement usually shows an offset or long-period noise in the record.',
    ],
  });
}

function markPeak(context: PanelContext, timesS: Float64Array, values: Float64Array, unit: string): void {
  const { doc, group, x, y, plot } = context;
  const i = peakIndex(values);
  const px = x(timesS[i]);
  const py = y(values[i]);
  const mark = doc.element(group, 'g', { class: 'peak', 'data-value': values[i], 'data-time': timesS[i] });
  doc.element(mark, 'circle', {
    cx: px,
    cy: py,
    r: 3.2,
    fill: 'none',
    stroke: TEXT_COLOUR,
    'stroke-width': 1.2,
  });
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
  doc.element(mark, 'circle', {
    cx: right - 4,
    cy: plot.top - 7.5,
    r: 3.2,
    fill: 'none',
    stroke: TEXT_COLOUR,
    'stroke-width': 1.2,
  });
}
