import type { DampingComparison, DampingCurveComparison } from '../spectrum/damping.js';
import type { SpectrumRecordInfo } from '../spectrum/spectrum.js';
import { renderFigure } from './figure.js';
import type { PanelContext, PanelSpec, Series } from './panel.js';
import { type PeriodAxis, periodAxisSpec } from './period-axis.js';
import { inG } from './spectrum-figure.js';
import { seriesStyle, TEXT_COLOUR } from './styles.js';
import { methodLine, percentLabel, processingLines, recordLine, zeroPeriodNotes } from './text.js';

export interface DampingFigureInput {
  record: SpectrumRecordInfo;
  /** How the oscillators were solved, one line. */
  methodDescription: string;
  comparison: DampingComparison;
  /** The horizontal axis: period T (default) or frequency f = 1/T. */
  axis?: PeriodAxis;
}

/** The published ratios by source: the label at the right end of each line names its source. */
const REFERENCES = {
  ec8: { label: 'EC8 η' },
  acceleration: { label: 'NH acc.' },
  velocity: { label: 'NH vel.' },
  displacement: { label: 'NH disp.' },
} as const;

type ReferenceKind = keyof typeof REFERENCES;

/** A published ratio for one damping ratio, drawn as a horizontal line. */
type Reference = { kind: ReferenceKind; damping: number; value: number };

/**
 * The record's PSA at each damping ratio (top) and its ratio to the reference damping's PSA period
 * by period (bottom), with the published ratios drawn as labelled horizontal lines: Eurocode 8
 * η(ξ)/η(5%) (EN 1998-1 §3.2.2.2, Eq. 3.6) and the Newmark–Hall (1982) median amplification
 * factors for the acceleration, velocity and displacement regions, each at ξ over at 5%.
 */
export function dampingFigure(input: DampingFigureInput): string {
  const { comparison, record } = input;
  const periods = comparison.periodsS;
  const positive = Array.from(periods).filter((t) => t > 0);
  const periodRange = [Math.min(...positive), Math.max(...positive)];
  const reference = percentLabel(comparison.referenceDamping);
  const curveSeries = (y: (curve: DampingCurveComparison) => ArrayLike<number>, legend: boolean) =>
    comparison.curves.map(
      (curve, i): Series => ({
        label: `ζ = ${percentLabel(curve.damping)}`,
        x: periods,
        y: y(curve),
        style: seriesStyle(i),
        legend,
      }),
    );
  const ratioSeries = curveSeries((curve) => curve.ratio, false);
  const references: Reference[] = [];
  const others = comparison.curves.filter((c) => Math.abs(c.damping - comparison.referenceDamping) > 1e-12);
  for (const { damping, published } of others) {
    references.push({ kind: 'ec8', damping, value: published.ec8Eta });
    for (const kind of ['acceleration', 'velocity', 'displacement'] as const) {
      const value = published.newmarkHall[kind];
      if (value !== null) references.push({ kind, damping, value });
    }
  }
  // Dashes mean one thing in both panels, the damping ratio: each published line is thin, in the
  // colour and dash of its damping ratio, and named by its label at the right.
  const styleOf = (damping: number) => seriesStyle(comparison.curves.findIndex((c) => c.damping === damping));
  const referenceSeries = references.map(
    (r): Series => ({
      label: `${REFERENCES[r.kind].label}, ζ = ${percentLabel(r.damping)}`,
      x: periodRange,
      y: [r.value, r.value],
      style: { ...styleOf(r.damping), widthPx: 0.9 },
      legend: false,
      kind: 'reference',
    }),
  );
  const ratios = [...ratioSeries, ...referenceSeries].flatMap((s) =>
    Array.from(s.y).filter((v, i) => s.x[i] > 0 && Number.isFinite(v)),
  );
  const low = ratios.reduce((m, v) => Math.min(m, v), 1);
  const high = ratios.reduce((m, v) => Math.max(m, v), 1);
  const pad = 0.06 * (high - low || 1);
  const psaTitle = `PSA(ζ) / PSA(${reference})`;
  const xAxis = periodAxisSpec(input.axis);
  const panels: PanelSpec[] = [
    {
      heightPx: 250,
      x: xAxis,
      y: { title: 'PSA (g)' },
      series: curveSeries((curve) => inG(curve.psaMS2), true),
      xLabels: false,
    },
    {
      heightPx: 230,
      gapAbovePx: 16,
      x: xAxis,
      y: { title: psaTitle, scale: 'linear', domain: [Math.max(0, low - pad), high + pad] },
      series: [...referenceSeries, ...ratioSeries],
      overlay: (context) => labelReferences(context, references, (d) => styleOf(d).color),
    },
  ];
  return renderFigure({
    title: 'Damping comparison: PSA and its ratio to 5% damping',
    subtitle: [
      recordLine('Record', record),
      ...processingLines(record.processing),
      methodLine(input.methodDescription, comparison.curves),
    ],
    panels,
    legendTitle: 'Damping:',
    rightMarginPx: 104,
    notes: [
      `Bottom: the record's PSA at each damping ratio divided by its PSA at ${reference}, period by period. Thin horizontal lines, in the colour and dash of their damping ratio as in both panels: the published ratios for that damping, each named by its label at the right.`,
      'EC8 η: η(ξ)/η(5%) with η = √(10/(5 + ξ)) ≥ 0.55, ξ in percent (EN 1998-1:2004 §3.2.2.2, Eq. 3.6). NH: Newmark and Hall (1982) median amplification factors 3.21 − 0.68 ln ξ (acc.), 2.31 − 0.41 ln ξ (vel.), 1.82 − 0.27 ln ξ (disp.), each at ξ over at 5% (Earthquake Spectra and Design, EERI); they apply in the acceleration-, velocity- and displacement-sensitive period ranges respectively.',
      ...zeroPeriodNotes(periods, ' (there every ratio is 1)', input.axis),
    ],
  });
}

const LABEL_PX = 8.5;

/** Labels at the right end of the reference lines, pushed apart vertically so none overlap. */
function labelReferences(
  context: PanelContext,
  references: readonly Reference[],
  colourOf: (damping: number) => string,
): void {
  const { doc, group, y, plot } = context;
  const text = (r: Reference) =>
    `${percentLabel(r.damping)}: ${REFERENCES[r.kind].label} ${r.value.toFixed(2)}`;
  const placed = references
    .map((r) => ({ ...r, at: y(r.value), textY: y(r.value), text: text(r) }))
    .sort((a, b) => a.at - b.at);
  const gap = LABEL_PX + 1.5;
  for (let i = 1; i < placed.length; i++) {
    placed[i].textY = Math.max(placed[i].textY, placed[i - 1].textY + gap);
  }
  const bottom = plot.top + plot.height + 20;
  const overflow = placed.length > 0 ? placed[placed.length - 1].textY - bottom : 0;
  if (overflow > 0) {
    for (const p of placed) p.textY -= overflow;
    for (let i = placed.length - 2; i >= 0; i--)
      placed[i].textY = Math.min(placed[i].textY, placed[i + 1].textY - gap);
  }
  const labels = doc.element(group, 'g', {
    class: 'reference-labels',
    'font-size': LABEL_PX,
    fill: TEXT_COLOUR,
  });
  // Outside the frame on the right, each joined to its line by a short leader.
  const right = plot.left + plot.width;
  for (const p of placed) {
    doc.element(labels, 'path', {
      d: `M${right},${p.at}L${right + 6},${p.textY}`,
      stroke: colourOf(p.damping),
      'stroke-width': 0.7,
      fill: 'none',
    });
    doc.text(labels, p.text, {
      x: right + 8,
      y: p.textY + LABEL_PX * 0.35,
      fill: colourOf(p.damping),
      'data-value': p.value,
    });
  }
}
