import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { RotDSpectra } from '../spectrum/rotd.js';
import { lineChart } from './line-chart.js';
import type { Series } from './panel.js';
import { type PeriodAxis, periodAxisSpec } from './period-axis.js';
import { inG, PSA_AXIS } from './spectrum-figure.js';
import { DAMPING_DASHES } from './styles.js';
import { formatValue, methodLine, percentLabel, recordLine, zeroPeriodNotes } from './text.js';

export interface RotDFigureInput {
  spectra: RotDSpectra;
  /** How the oscillators were solved, one line. */
  methodDescription: string;
  /** The horizontal axis: period T (default) or frequency f = 1/T. */
  axis?: PeriodAxis;
}

/**
 * Colour by measure (Okabe and Ito 2008), and the geometric mean, which runs close to RotD50, also
 * dashed and marked with hollow circles so the two part in greyscale; with several damping ratios
 * the dash is the damping's and the circles alone mark the geometric mean.
 */
const MEASURES = [
  { key: 'rotd100MS2', label: 'RotD100', color: '#D55E00', dash: 'none', marker: undefined },
  { key: 'rotd50MS2', label: 'RotD50', color: '#0072B2', dash: 'none', marker: undefined },
  { key: 'geomeanMS2', label: 'geometric mean', color: '#009E73', dash: '7 3', marker: 'circle' },
] as const;

/**
 * RotD50, RotD100 (Boore 2010) and the geometric mean of the two components as recorded, PSA (g)
 * against period on log–log axes; one colour per measure (the geometric mean also marked), one dash
 * pattern per damping ratio when there are several.
 */
export function rotdFigure(input: RotDFigureInput): string {
  const { spectra } = input;
  const series = spectra.curves.flatMap((curve, d) =>
    MEASURES.map(
      (measure): Series => ({
        label:
          spectra.curves.length > 1 ? `${measure.label}, ζ = ${percentLabel(curve.damping)}` : measure.label,
        x: spectra.periodsS,
        y: inG(curve[measure.key]),
        style: {
          color: measure.color,
          dash: spectra.curves.length > 1 ? DAMPING_DASHES[d % DAMPING_DASHES.length] : measure.dash,
          widthPx: 1.6,
          marker: measure.marker,
        },
      }),
    ),
  );
  const subtitle = spectra.records.map((r, i) => recordLine(`Component ${i + 1}`, r));
  for (const [i, r] of spectra.records.entries())
    for (const step of r.processing) subtitle.push(`Component ${i + 1} processed: ${step.description}`);
  subtitle.push(methodLine(input.methodDescription, spectra.curves));
  const inGAt = (values: Float64Array, zero: number) => formatValue(values[zero] / STANDARD_GRAVITY_MS2);
  const { rotd50MS2, rotd100MS2 } = spectra.curves[0];
  const notes = [
    `PSA(θ) = ω² max|u₁ cos θ + u₂ sin θ| over ${180 / spectra.angleStepDeg} angles 0 ≤ θ < 180° in steps of ${spectra.angleStepDeg}°; RotD50 is the median over the angles, RotD100 the largest (Boore 2010); geometric mean √(PSA₁·PSA₂) of the components as recorded.`,
    ...(spectra.paddedSamples > 0
      ? [`The shorter component was padded with ${spectra.paddedSamples} zero samples (ground at rest).`]
      : []),
    ...zeroPeriodNotes(
      spectra.periodsS,
      (zero) => ` (there RotD50 = ${inGAt(rotd50MS2, zero)} g, RotD100 = ${inGAt(rotd100MS2, zero)} g)`,
      input.axis,
    ),
  ];
  return lineChart({
    title: 'Two-component spectra: RotD50, RotD100 and geometric mean PSA',
    subtitle,
    x: periodAxisSpec(input.axis),
    y: PSA_AXIS,
    series,
    notes,
  });
}
