import { LENGTH_UNITS, type LengthUnit, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import { lineChart } from './line-chart.js';
import type { AxisScale, Series } from './panel.js';
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
}

/** A curve drawn over the data, e.g. a target design spectrum; PSA in g at periods in s. */
export interface PsaOverlay {
  label: string;
  periodsS: ArrayLike<number>;
  psaG: ArrayLike<number>;
}

export interface PsaFigureOptions extends SpectrumFigureOptions {
  overlays?: readonly PsaOverlay[];
}

/** The lines that say where a spectrum comes from: record, processing, method and damping. */
export function spectrumSubtitle(spectrum: Spectrum, methodDescription?: string): string[] {
  const method = methodLine(methodDescription ?? spectrum.method, spectrum.curves);
  return [recordLine('Record', spectrum.record), ...processingLines(spectrum.record.processing), method];
}

/** The note that T = 0 is left off a log period axis, when the grid holds it. */
export function spectrumZeroNote(spectrum: Spectrum, axes: AxisScale, there: string): string[] {
  return axes === 'log' ? zeroPeriodNotes(spectrum.periodsS, there) : [];
}

/** One curve per damping ratio: the values `pick` gives for curve i, times `scale`. */
export function dampingSeries(
  spectrum: Spectrum,
  pick: (index: number) => Float64Array,
  scale: number,
): Series[] {
  return spectrum.curves.map((curve, i) => ({
    label: `ζ = ${percentLabel(curve.damping)}`,
    x: spectrum.periodsS,
    y: pick(i).map((v) => v * scale),
  }));
}

export function overlaySeries(
  overlays: readonly PsaOverlay[] | undefined,
  toY: (psaG: number, t: number) => number,
) {
  return (overlays ?? []).map(
    (overlay, i): Series => ({
      label: overlay.label,
      x: overlay.periodsS,
      y: Array.from(overlay.psaG, (a, k) => toY(a, overlay.periodsS[k])),
      style: overlayStyle(i),
      kind: 'overlay',
    }),
  );
}

/** PSA (g) against period, one curve per damping ratio, optional overlays (e.g. a design spectrum). */
export function psaFigure(spectrum: Spectrum, options: PsaFigureOptions = {}): string {
  const axes = options.axes ?? 'log';
  const pgaG = spectrum.record.pgaMS2 / STANDARD_GRAVITY_MS2;
  return lineChart({
    title: 'Pseudo-acceleration response spectrum PSA',
    subtitle: spectrumSubtitle(spectrum, options.methodDescription),
    x: { title: 'Period T (s)' },
    y: { title: 'Pseudo-acceleration PSA (g)' },
    axes,
    legendTitle: 'Damping:',
    series: [
      ...dampingSeries(spectrum, (i) => spectrum.curves[i].psaMS2, 1 / STANDARD_GRAVITY_MS2),
      ...overlaySeries(options.overlays, (a) => a),
    ],
    notes: [
      'PSA = ω²·SD with ω = 2π/T; at T = 0, PSA is the peak ground acceleration.',
      ...spectrumZeroNote(spectrum, axes, ` (there PSA = PGA = ${formatValue(pgaG)} g)`),
    ],
  });
}

/** SD against period, one curve per damping ratio. */
export function sdFigure(spectrum: Spectrum, options: SpectrumFigureOptions = {}): string {
  const axes = options.axes ?? 'log';
  const unit = options.lengthUnit ?? 'm';
  return lineChart({
    title: 'Displacement response spectrum SD',
    subtitle: spectrumSubtitle(spectrum, options.methodDescription),
    x: { title: 'Period T (s)' },
    y: { title: `Relative displacement SD (${unit})` },
    axes,
    legendTitle: 'Damping:',
    series: dampingSeries(spectrum, (i) => spectrum.curves[i].sdM, 1 / LENGTH_UNITS[unit]),
    notes: [
      'SD is the peak displacement of the oscillator relative to the ground.',
      ...spectrumZeroNote(spectrum, axes, ' (there SD = 0)'),
    ],
  });
}

/** PSV against period, one curve per damping ratio. */
export function psvFigure(spectrum: Spectrum, options: SpectrumFigureOptions = {}): string {
  const axes = options.axes ?? 'log';
  const unit = options.lengthUnit ?? 'm';
  return lineChart({
    title: 'Pseudo-velocity response spectrum PSV',
    subtitle: spectrumSubtitle(spectrum, options.methodDescription),
    x: { title: 'Period T (s)' },
    y: { title: `Pseudo-velocity PSV (${unit}/s)` },
    axes,
    legendTitle: 'Damping:',
    series: dampingSeries(spectrum, (i) => spectrum.curves[i].psvMS, 1 / LENGTH_UNITS[unit]),
    notes: ['PSV = ω·SD with ω = 2π/T.', ...spectrumZeroNote(spectrum, axes, ' (there PSV = 0)')],
  });
}
