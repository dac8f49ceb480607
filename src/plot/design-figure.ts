import type { DesignSpectrum } from '../spectrum/design.js';
import { lineChart } from './line-chart.js';
import { type PeriodAxis, periodAxisSpec } from './period-axis.js';
import { overlayStyle } from './styles.js';
import { formatValue, percentLabel, zeroPeriodNotes } from './text.js';

const CODE_LABELS: Readonly<Record<DesignSpectrum['code'], string>> = {
  'asce7-16': 'ASCE/SEI 7-16 design spectrum',
  'asce7-22': 'ASCE/SEI 7-22 design spectrum',
  ec8: 'Eurocode 8 elastic spectrum',
  table: 'tabulated design spectrum',
};

export interface DesignFigureInput {
  spectrum: DesignSpectrum;
  /** The periods the spectrum was evaluated at, s. */
  periodsS: ArrayLike<number>;
  /** PSA at those periods, g. */
  psaG: ArrayLike<number>;
  /** The horizontal axis: period T (default) or frequency f = 1/T. */
  axis?: PeriodAxis;
}

/**
 * A code design spectrum, PSA (g) against period (or frequency) on log–log axes, drawn as the reference curves
 * are drawn over record spectra. T = 0 cannot sit on a log axis: it is left off and its value stated.
 */
export function designFigure(input: DesignFigureInput): string {
  const { spectrum } = input;
  const notes = [
    ...zeroPeriodNotes(
      input.periodsS,
      (zero) => ` (there ${spectrum.vertical ? 'S_av' : 'PSA'} = ${formatValue(input.psaG[zero])} g)`,
      input.axis,
    ),
    'A code design spectrum is a smoothed envelope for design, not the response to any one record; its parameters are as given, not chosen by this tool.',
  ];
  const drawn = densified(input);
  const damping = spectrum.damping === undefined ? 'not stated' : percentLabel(spectrum.damping);
  return lineChart({
    title: spectrum.vertical ? 'Vertical design spectrum S_av' : 'Design spectrum, pseudo-acceleration PSA',
    subtitle: [`Spectrum: ${spectrum.description}`, `Damping: ${damping}`],
    x: spectrum.vertical
      ? {
          ...periodAxisSpec(input.axis),
          title:
            input.axis === 'frequency' ? 'Vertical frequency f_v = 1/T_v (Hz)' : 'Vertical period T_v (s)',
        }
      : periodAxisSpec(input.axis),
    y: {
      title: spectrum.vertical ? 'Vertical spectral acceleration S_av (g)' : 'Pseudo-acceleration PSA (g)',
    },
    series: [
      {
        label: seriesLabel(spectrum),
        x: drawn.periodsS,
        y: drawn.psaG,
        style: overlayStyle(0),
      },
    ],
    notes,
  });
}

/** The legend's name of the curve: the code's, with the ASCE 7-22 form. */
function seriesLabel(spectrum: DesignSpectrum): string {
  if (spectrum.vertical) return `${CODE_LABELS[spectrum.code]}, vertical (§11.9)`;
  const form = spectrum.code === 'asce7-22' ? spectrum.parameters.form : undefined;
  return form === undefined ? CODE_LABELS[spectrum.code] : `ASCE/SEI 7-22 ${form} design spectrum`;
}

/**
 * The curve to draw: a code spectrum is a function, so it is drawn at the periods asked for plus
 * 400 log-spaced ones over the same range, which keeps its corners sharp; a table (and the ASCE
 * 7-22 multi-period table) is drawn as given.
 */
function densified(input: DesignFigureInput): { periodsS: number[]; psaG: number[] } {
  const given = Array.from(input.periodsS);
  const positive = given.filter((t) => t > 0);
  if (input.spectrum.tabulatedPeriodsS !== undefined || positive.length < 2) {
    return { periodsS: given, psaG: Array.from(input.psaG) };
  }
  const low = Math.min(...positive);
  const high = Math.max(...positive);
  const extra = Array.from({ length: 400 }, (_, i) => low * (high / low) ** (i / 399));
  const periodsS = [...new Set([...positive, ...extra])].sort((a, b) => a - b);
  return { periodsS, psaG: periodsS.map((t) => input.spectrum.psaG(t)) };
}
