import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { RotDSpectra } from '../spectrum/rotd.js';
import { lineChart } from './line-chart.js';
import type { Series } from './panel.js';
import { DAMPING_DASHES, type SeriesStyle } from './styles.js';
import { formatValue, methodLine, percentLabel, recordLine, zeroPeriodNote } from './text.js';

export interface RotDFigureInput {
  spectra: RotDSpectra;
  /** How the oscillators were solved, one line. */
  methodDescription: string;
}

/** Colour by measure (Okabe and Ito 2008), dash by damping ratio. */
const MEASURES = [
  { key: 'rotd100MS2', label: 'RotD100', color: '#D55E00' },
  { key: 'rotd50MS2', label: 'RotD50', color: '#0072B2' },
  { key: 'geomeanMS2', label: 'geometric mean', color: '#009E73' },
] as const;

/**
 * RotD50, RotD100 (Boore 2010) and the geometric mean of the two components as recorded, PSA (g)
 * against period on log–log axes; one colour per measure, one dash pattern per damping ratio.
 */
export function rotdFigure(input: RotDFigureInput): string {
  const { spectra } = input;
  const many = spectra.curves.length > 1;
  const series: Series[] = [];
  spectra.curves.forEach((curve, d) => {
    for (const measure of MEASURES) {
      const style: SeriesStyle = {
        color: measure.color,
        dash: DAMPING_DASHES[d % DAMPING_DASHES.length],
        widthPx: 1.6,
      };
      series.push({
        label: many ? `${measure.label}, ζ = ${percentLabel(curve.damping)}` : measure.label,
        x: spectra.periodsS,
        y: Array.from(curve[measure.key], (v) => v / STANDARD_GRAVITY_MS2),
        style,
      });
    }
  });
  const subtitle = spectra.records.map((r, i) => recordLine(`Component ${i + 1}`, r));
  for (const [i, r] of spectra.records.entries())
    for (const step of r.processing) subtitle.push(`Component ${i + 1} processed: ${step.description}`);
  subtitle.push(methodLine(input.methodDescription, spectra.curves));
  const notes = [
    `PSA(θ) = ω² max|u₁ cos θ + u₂ sin θ| over ${180 / spectra.angleStepDeg} angles 0 ≤ θ < 180° in steps of ${spectra.angleStepDeg}°; RotD50 is the median over the angles, RotD100 the largest (Boore 2010); geometric mean √(PSA₁·PSA₂) of the components as recorded.`,
  ];
  if (spectra.paddedSamples > 0) {
    notes.push(
      `The shorter component was padded with ${spectra.paddedSamples} zero samples (ground at rest).`,
    );
  }
  const zero = Array.from(spectra.periodsS).indexOf(0);
  if (zero >= 0) {
    const c = spectra.curves[0];
    const there = (values: Float64Array) => formatValue(values[zero] / STANDARD_GRAVITY_MS2);
    notes.push(
      zeroPeriodNote(` (there RotD50 = ${there(c.rotd50MS2)} g, RotD100 = ${there(c.rotd100MS2)} g)`),
    );
  }
  return lineChart({
    title: 'Two-component spectra: RotD50, RotD100 and geometric mean PSA',
    subtitle,
    x: { title: 'Period T (s)' },
    y: { title: 'Pseudo-acceleration PSA (g)' },
    series,
    notes,
  });
}
