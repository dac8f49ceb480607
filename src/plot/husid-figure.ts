import { lineChart } from './line-chart.js';
import type { PanelContext } from './panel.js';
import { MARK_LABEL, MARK_LINE } from './styles.js';
import { processingLines, recordNameLine } from './text.js';

export interface HusidFigureInput {
  /** The record's name and where it came from. */
  name: string;
  source?: string;
  dtS: number;
  /** Normalised Husid curve, 0 → 1, one value a sample. */
  husid: ArrayLike<number>;
  t5S: number;
  t75S: number;
  t95S: number;
  /** What was done to the record, one line each. */
  processing?: readonly { description: string }[];
}

/**
 * The Husid curve, normalised Arias intensity (Arias 1970) against time, with the 5, 75 and 95%
 * levels and the significant durations D5–75 and D5–95 (Trifunac and Brady 1975) marked.
 */
export function husidFigure(input: HusidFigureInput): string {
  const n = input.husid.length;
  const timesS = Float64Array.from({ length: n }, (_, i) => i * input.dtS);
  const durationS = n > 1 ? timesS[n - 1] : input.dtS;
  const subtitle = [
    `${recordNameLine(input.name, input.source)}; ${n} samples at Δt = ${input.dtS} s`,
    ...processingLines(input.processing, 'Processed: nothing (as read)'),
    'Method: I(t) = ∫₀ᵗ a² dt / ∫₀ᵀ a² dt by the trapezoidal rule (Husid 1969; Arias 1970)',
  ];
  const levels: [number, number][] = [
    [0.05, input.t5S],
    [0.75, input.t75S],
    [0.95, input.t95S],
  ];
  return lineChart({
    title: 'Husid curve: normalised Arias intensity',
    subtitle,
    x: { title: 'Time t (s)', domain: [0, durationS] },
    y: { title: 'Normalised Arias intensity', domain: [0, 1] },
    axes: 'linear',
    heightPx: 300,
    series: [
      {
        label: 'Husid curve',
        x: timesS,
        y: input.husid,
        style: { color: '#0072B2', dash: 'none', widthPx: 1.6 },
        legend: false,
        decimate: true,
      },
    ],
    overlay: (context) => markLevels(context, levels),
    notes: [
      `D5–75 = ${(input.t75S - input.t5S).toFixed(2)} s, D5–95 = ${(input.t95S - input.t5S).toFixed(2)} s: significant durations between the times the curve reaches 5%, 75% and 95% (Trifunac and Brady 1975), linear between samples.`,
    ],
  });
}

function markLevels(context: PanelContext, levels: readonly [number, number][]): void {
  const { doc, group, x, y, plot } = context;
  const marks = doc.element(group, 'g', { class: 'levels', fill: 'none' });
  for (const [level, timeS] of levels) {
    const px = x(timeS);
    const py = y(level);
    const mark = doc.element(marks, 'g', { class: 'level', 'data-level': level, 'data-time': timeS });
    const d = `M${plot.left},${py}H${px}V${plot.top + plot.height}`;
    doc.element(mark, 'path', { d, ...MARK_LINE, 'stroke-dasharray': '4 3' });
    const label = `${level * 100}% at t = ${timeS.toFixed(2)} s`;
    doc.text(mark, label, { x: px + 5, y: py + (level > 0.5 ? 12 : -5), ...MARK_LABEL });
  }
}
