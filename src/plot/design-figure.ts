import type { DesignSpectrum } from '../spectrum/design.js';
import { lineChart } from './line-chart.js';
import { overlayStyle } from './styles.js';
import { formatValue } from './text.js';

const CODE_LABELS: Readonly<Record<DesignSpectrum['code'], string>> = {
  'asce7-16': 'ASCE/SEI 7-16 design spectrum',
  ec8: 'Eurocode 8 elastic spectrum',
  table: 'tabulated design spectrum',
};

export interface DesignFigureInput {
  spectrum: DesignSpectrum;
  /** The periods the spectrum was evaluated at, s. */
  periodsS: ArrayLike<number>;
  /** PSA at those periods, g. */
  psaG: ArrayLike<number>;
}

/**
 * A code design spectrum, PSA (g) against period on log–log axes, drawn as the reference curves
 * are drawn over record spectra. T = 0 cannot sit on a log axis: it is left off and its value stated.
 */
export function designFigure(input: DesignFigureInput): string {
  const { spectrum } = input;
  const notes: string[] = [];
  const zero = Array.from(input.periodsS).indexOf(0);
  if (zero >= 0) {
    notes.push(
      `T = 0 s is in the period grid but cannot be drawn on a logarithmic axis; it is left off (there PSA = ${formatValue(input.psaG[zero])} g).`,
    );
  }
  notes.push(
    'A code design spectrum is a smoothed envelope for design, not the response to any one record; its parameters are as given, not chosen by this tool.',
  );
  const damping =
    spectrum.damping === undefined ? 'not stated' : `${Number((spectrum.damping * 100).toPrecision(6))}%`;
  return lineChart({
    title: 'Design spectrum, pseudo-acceleration PSA',
    subtitle: [`Spectrum: ${spectrum.description}`, `Damping: ${damping}`],
    x: { title: 'Period T (s)' },
    y: { title: 'Pseudo-acceleration PSA (g)' },
    axes: 'log',
    series: [
      {
        label: CODE_LABELS[spectrum.code],
        x: input.periodsS,
        y: input.psaG,
        style: overlayStyle(0),
        kind: 'curve',
      },
    ],
    notes,
  });
}
