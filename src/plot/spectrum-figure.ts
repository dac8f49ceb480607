import { LENGTH_UNITS, type LengthUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import { type LineChartOptions, lineChart } from './line-chart.js';
import type { AxisScale, PanelContext, Series } from './panel.js';
import { type PeriodAxis, periodAxisSpec } from './period-axis.js';
import { overlayStyle } from './styles.js';
import {
  formatValue,
  methodLine,
  percentLabel,
  processingLines,
  recordLine,
  zeroPeriodNotes,
} from './text.js';

export interface SpectrumFigureOptions {
  /** 'log' (default) for log–log axes, 'linear' for linear ones. */
  axes?: AxisScale;
  /** Unit of SD and PSV; default m. */
  lengthUnit?: LengthUnit;
  /** How the oscillators were solved, for the subtitle; default the method's name. */
  methodDescription?: string;
  /** The horizontal axis: period T (default) or frequency f = 1/T, log-spaced either way. */
  axis?: PeriodAxis;
}

/** A curve drawn over the data, e.g. a target design spectrum; PSA in g at periods in s. */
export interface PsaOverlay {
  label: string;
  periodsS: ArrayLike<number>;
  psaG: ArrayLike<number>;
  /** A period range to shade under the curves (e.g. where a record was fitted to the target), s. */
  rangeS?: readonly [number, number];
}

export interface PsaFigureOptions extends SpectrumFigureOptions {
  overlays?: readonly PsaOverlay[];
}

export const PSA_AXIS = { title: 'Pseudo-acceleration PSA (g)' };

/** Accelerations in m/s² as values in g. */
export function inG(valuesMS2: ArrayLike<number>): number[] {
  return Array.from(valuesMS2, (v) => v / STANDARD_GRAVITY_MS2);
}

/** The lines that say where a spectrum comes from: record, processing, method and damping. */
export function spectrumSubtitle(spectrum: Spectrum, methodDescription?: string): string[] {
  const method = methodLine(methodDescription ?? spectrum.method, spectrum.curves);
  return [recordLine('Record', spectrum.record), ...processingLines(spectrum.record.processing), method];
}

/** What a spectrum chart draws: `quantity` times `scale` and, where `overlayY` is given, the overlays. */
type SpectrumChart = Omit<LineChartOptions, 'x' | 'series'> & {
  quantity: 'sdM' | 'psvMS' | 'psaMS2';
  scale: number;
  /** An overlay's value drawn at period `t` for its PSA (g). */
  overlayY?: (psaG: number, t: number) => number;
  note: string;
  /** The value at T = 0 for the note that it is left off a log axis; default PSA = PGA. */
  zeroThere?: string;
};

/**
 * A spectrum quantity against period, one curve per damping ratio, then the overlays: the record
 * and method in the subtitle, the damping ratios in the legend, the note on T = 0 off a log axis.
 */
export function spectrumChart(
  spectrum: Spectrum,
  options: PsaFigureOptions,
  { quantity, scale, overlayY, note, zeroThere, ...chart }: SpectrumChart,
): string {
  const curves = spectrum.curves.map(
    (curve): Series => ({
      label: `ζ = ${percentLabel(curve.damping)}`,
      x: spectrum.periodsS,
      y: curve[quantity].map((v) => v * scale),
    }),
  );
  const overlays =
    overlayY === undefined
      ? []
      : (options.overlays ?? []).map(
          (overlay, i): Series => ({
            label: overlay.label,
            x: overlay.periodsS,
            y: Array.from(overlay.psaG, (a, k) => overlayY(a, overlay.periodsS[k])),
            style: overlayStyle(i),
            kind: 'overlay',
          }),
        );
  const axes = chart.axes ?? options.axes ?? 'log';
  const axis = options.axis ?? 'period';
  const pga = ` (there PSA = PGA = ${formatValue(spectrum.record.pgaMS2 / STANDARD_GRAVITY_MS2)} g)`;
  // T = 0 cannot be drawn on a log period axis, nor at f = ∞ on any frequency axis.
  const zeroLeftOff = axes === 'log' || axis === 'frequency';
  const ranged = overlayY === undefined ? undefined : options.overlays?.find((o) => o.rangeS)?.rangeS;
  const rangeNote = ranged
    ? [
        `Shaded: the periods over which the record was fitted to the target, ${formatValue(ranged[0])} to ${formatValue(ranged[1])} s.`,
      ]
    : [];
  return lineChart({
    ...chart,
    underlay:
      ranged === undefined
        ? chart.underlay
        : (context) => {
            shadePeriods(context, ranged);
            chart.underlay?.(context);
          },
    subtitle: spectrumSubtitle(spectrum, options.methodDescription),
    x: periodAxisSpec(axis),
    axes,
    legendTitle: 'Damping:',
    series: [...curves, ...overlays],
    notes: [
      note,
      ...rangeNote,
      ...(zeroLeftOff ? zeroPeriodNotes(spectrum.periodsS, zeroThere ?? pga, axis) : []),
    ],
  });
}

/** A period range shaded over the plot's height, a grey veil that lets the grid show through. */
function shadePeriods(context: PanelContext, [fromS, toS]: readonly [number, number]): void {
  const { doc, group, x, plot, xDomain } = context;
  const from = Math.max(fromS, xDomain[0]);
  const to = Math.min(toS, xDomain[1]);
  if (!(to > from)) return;
  const [a, b] = [x(from), x(to)].sort((p, q) => p - q);
  doc.element(group, 'rect', {
    class: 'fit-range',
    x: a,
    y: plot.top,
    width: b - a,
    height: plot.height,
    fill: '#000000',
    'fill-opacity': 0.07,
  });
}

/** PSA (g) against period, one curve per damping ratio, optional overlays (e.g. a design spectrum). */
export function psaFigure(spectrum: Spectrum, options: PsaFigureOptions = {}): string {
  return spectrumChart(spectrum, options, {
    title: 'Pseudo-acceleration response spectrum PSA',
    y: PSA_AXIS,
    quantity: 'psaMS2',
    scale: 1 / STANDARD_GRAVITY_MS2,
    overlayY: (psaG) => psaG,
    note: 'PSA = ω²·SD with ω = 2π/T; at T = 0, PSA is the peak ground acceleration.',
  });
}

/** SD against period, one curve per damping ratio. */
export function sdFigure(spectrum: Spectrum, options: SpectrumFigureOptions = {}): string {
  const unit = options.lengthUnit ?? 'm';
  return spectrumChart(spectrum, options, {
    title: 'Displacement response spectrum SD',
    y: { title: `Relative displacement SD (${unit})` },
    quantity: 'sdM',
    scale: 1 / LENGTH_UNITS[unit],
    note: 'SD is the peak displacement of the oscillator relative to the ground.',
    zeroThere: ' (there SD = 0)',
  });
}

/** PSV against period, one curve per damping ratio. */
export function psvFigure(spectrum: Spectrum, options: SpectrumFigureOptions = {}): string {
  const unit = options.lengthUnit ?? 'm';
  return spectrumChart(spectrum, options, {
    title: 'Pseudo-velocity response spectrum PSV',
    y: { title: `Pseudo-velocity PSV (${unit}/s)` },
    quantity: 'psvMS',
    scale: 1 / LENGTH_UNITS[unit],
    note: 'PSV = ω·SD with ω = 2π/T.',
    zeroThere: ' (there PSV = 0)',
  });
}
