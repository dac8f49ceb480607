import { formatNumber } from '../base/numbers.js';
import { clearLabelSpot, type LabelSpot, type Segment } from './label-spot.js';
import { lineChart } from './line-chart.js';
import type { PanelContext } from './panel.js';
import { MARK_LABEL, MARK_LINE } from './styles.js';
import { processingLines, recordNameLine } from './text.js';
import { textWidthPx } from './ticks.js';

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
    `${recordNameLine(input.name, input.source)}; ${n} samples at Δt = ${formatNumber(input.dtS, 6)} s`,
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
    // Headroom above 1, where the curve ends, so it does not run along the frame.
    y: { title: 'Normalised Arias intensity', domain: [0, 1.05] },
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
  const bottom = plot.top + plot.height;
  const marks = doc.element(group, 'g', { class: 'levels', fill: 'none' });
  // Each level's dashed line: across to the curve, then down to the time axis.
  const lines = levels.map(([level, timeS]): Segment[] => [
    [plot.left, y(level), x(timeS), y(level)],
    [x(timeS), y(level), x(timeS), bottom],
  ]);
  levels.forEach(([level, timeS], i) => {
    const px = x(timeS);
    const py = y(level);
    const mark = doc.element(marks, 'g', { class: 'level', 'data-level': level, 'data-time': timeS });
    const d = `M${plot.left},${py}H${px}V${bottom}`;
    doc.element(mark, 'path', { d, ...MARK_LINE, 'stroke-dasharray': '4 3' });
    const label = `${level * 100}% at t = ${timeS.toFixed(2)} s`;
    const size = {
      widthPx: textWidthPx(label, MARK_LABEL['font-size']),
      heightPx: MARK_LABEL['font-size'] * 1.2,
    };
    // Beside the point where the curve reaches the level, clear of the curve and of the other marks.
    const spots: LabelSpot[] = [
      { x: px + 5, y: py + 12, anchor: 'start' },
      { x: px - 5, y: py - 5, anchor: 'end' },
      { x: px + 5, y: py - 5, anchor: 'start' },
      { x: px + 5, y: py + 24, anchor: 'start' },
      { x: px - 5, y: py + 12, anchor: 'end' },
    ];
    const others = lines.filter((_, j) => j !== i).flat();
    const spot = clearLabelSpot(context, spots, size, others);
    doc.text(mark, label, { x: spot.x, y: spot.y, 'text-anchor': spot.anchor, ...MARK_LABEL });
  });
}
