import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { DuctilityDemandSpectra, DuctilitySpectra } from '../inelastic/ductility.js';
import { describeHysteresis } from '../inelastic/hysteresis.js';
import type { ReferenceReduction, ReferenceReductions } from '../inelastic/r-mu-t.js';
import type { SpectrumRecordInfo } from '../spectrum/spectrum.js';
import { lineChart } from './line-chart.js';
import type { PanelContext, Series } from './panel.js';
import { type PeriodAxis, periodAxisSpec } from './period-axis.js';
import { DAMPING_DASHES, MARK_LINE, type SeriesStyle, seriesStyle, TEXT_COLOUR } from './styles.js';
import { formatValue, percentLabel, processingLines, recordLine, zeroPeriodNotes } from './text.js';
import { textWidthPx } from './ticks.js';

export interface DuctilityFigureOptions {
  /** The horizontal axis: period T (default) or frequency f = 1/T, log-spaced either way. */
  axis?: PeriodAxis;
}

export interface DuctilityReductionOptions extends DuctilityFigureOptions {
  /** The published R–μ–T relations drawn beside the record's R_y (referenceReductions, r-mu-t.ts). */
  references: ReferenceReductions;
}

/** A figure as a file of a command's or a report's output. */
export interface NamedFigure {
  name: string;
  svg: string;
}

/** Each published relation: its dash, thin and in the colour of its ductility; grey in the legend. */
const RELATION_DASH: Record<ReferenceReduction['relation'], string> = {
  'newmark-hall': '6 3',
  'nassar-krawinkler': '1.5 2.5',
};
const REFERENCE_WIDTH_PX = 1;
const LABEL_PX = 9;

type Curve = { damping: number; ductility: number };

/**
 * The style of a constant-ductility curve: the colour and dash of its ductility's place; with
 * several damping ratios, the colour of the ductility and the dash of the damping ratio.
 */
function curveStyles(curves: readonly Curve[]): (curve: Curve) => SeriesStyle {
  const ductilities = [...new Set(curves.map((c) => c.ductility))];
  const dampings = [...new Set(curves.map((c) => c.damping))];
  return (curve) => {
    const style = seriesStyle(ductilities.indexOf(curve.ductility));
    if (dampings.length === 1) return style;
    return { ...style, dash: DAMPING_DASHES[dampings.indexOf(curve.damping) % DAMPING_DASHES.length] };
  };
}

function ductilityLabel(curve: Curve, severalDampings: boolean): string {
  const damping = severalDampings ? `, ζ = ${percentLabel(curve.damping)}` : '';
  return `μ = ${formatValue(curve.ductility)}${damping}`;
}

/** The lines under the title: the record, its processing, the model, damping and method. */
function subtitle(
  record: SpectrumRecordInfo,
  spectra: Pick<DuctilitySpectra, 'model' | 'method' | 'elastic'>,
): string[] {
  const dampings = spectra.elastic.map((e) => percentLabel(e.damping)).join(', ');
  return [
    recordLine('Record', record),
    ...processingLines(record.processing),
    `Model: ${describeHysteresis(spectra.model)}; viscous damping ζ = ${dampings} (at the elastic frequency)`,
    `Method: ${spectra.method}`,
  ];
}

/** How many cells missed their target by more than the tolerance (a jump in μ against strength). */
function offTargetNote(spectra: DuctilitySpectra): string[] {
  let off = 0;
  let cells = 0;
  for (const curve of spectra.curves) {
    curve.achievedDuctility.forEach((mu, p) => {
      if (spectra.periodsS[p] === 0) return;
      cells++;
      if (Math.abs(mu - curve.ductility) > spectra.tolerance * curve.ductility) off++;
    });
  }
  if (off === 0) return [];
  return [
    `At ${off} of ${cells} points no strength gives the target ductility to within ${percentLabel(spectra.tolerance)} (the demand jumps across it); the strength just above the jump is drawn, and its achieved ductility is in the tables.`,
  ];
}

/** Room right of the plot for the end labels, px: the longest label, its leader and a margin. */
function endLabelMarginPx(texts: readonly string[]): number {
  return Math.max(48, ...texts.map((t) => Math.ceil(textWidthPx(t, LABEL_PX) + 14)));
}

/** Labels at the right edge of the plot, one a curve, at its rightmost point, pushed apart. */
function labelCurveEnds(
  context: PanelContext,
  curves: readonly { series: Series; style: SeriesStyle; text: string }[],
): void {
  const { doc, group, x, y, plot } = context;
  const right = plot.left + plot.width;
  const placed = curves
    .map(({ series, style, text }) => {
      let best = -1;
      for (let i = 0; i < series.x.length; i++) {
        const v = series.y[i];
        if (!(series.x[i] > 0) || !(v > 0) || !Number.isFinite(v)) continue;
        if (best < 0 || x(series.x[i]) > x(series.x[best])) best = i;
      }
      const at = best < 0 ? Number.NaN : y(series.y[best]);
      return { text, color: style.color, at, textY: at };
    })
    .filter((p) => Number.isFinite(p.at))
    .sort((a, b) => a.at - b.at);
  const gap = LABEL_PX + 1.5;
  for (let i = 1; i < placed.length; i++)
    placed[i].textY = Math.max(placed[i].textY, placed[i - 1].textY + gap);
  const overflow = placed.length > 0 ? placed[placed.length - 1].textY - (plot.top + plot.height) : 0;
  if (overflow > 0) {
    for (const p of placed) p.textY -= overflow;
    for (let i = placed.length - 2; i >= 0; i--)
      placed[i].textY = Math.min(placed[i].textY, placed[i + 1].textY - gap);
  }
  const labels = doc.element(group, 'g', { class: 'curve-labels', 'font-size': LABEL_PX, fill: TEXT_COLOUR });
  for (const p of placed) {
    doc.element(labels, 'path', {
      d: `M${right},${p.at}L${right + 5},${p.textY}`,
      stroke: p.color,
      'stroke-width': 0.7,
      fill: 'none',
    });
    doc.text(labels, p.text, { x: right + 7, y: p.textY + LABEL_PX * 0.35, fill: p.color });
  }
}

/**
 * Constant-ductility spectra (figure a): the yield pseudo-acceleration A_y (g) against period for
 * each target ductility μ, log–log like the PSA figure; μ = 1 is the elastic PSA. T = 0 is left off
 * the log axis and its value (A_y = PGA for every μ) stated in a note.
 */
export function ductilityStrengthSvg(
  spectra: DuctilitySpectra,
  options: DuctilityFigureOptions = {},
): string {
  const several = spectra.elastic.length > 1;
  const style = curveStyles(spectra.curves);
  const series = spectra.curves.map(
    (curve): Series => ({
      label: `${ductilityLabel(curve, several)}${curve.ductility === 1 ? ' (elastic PSA)' : ''}`,
      x: spectra.periodsS,
      y: curve.ayG,
      style: style(curve),
    }),
  );
  const endLabels = spectra.curves.map((curve) => ductilityLabel(curve, several));
  const pgaG = formatValue(spectra.record.pgaMS2 / STANDARD_GRAVITY_MS2);
  return lineChart({
    title: 'Constant-ductility spectra: yield pseudo-acceleration A_y',
    subtitle: subtitle(spectra.record, spectra),
    x: periodAxisSpec(options.axis),
    y: { title: 'Yield pseudo-acceleration A_y (g)' },
    legendTitle: 'Target ductility:',
    series,
    rightMarginPx: endLabelMarginPx(endLabels),
    overlay: (context) =>
      labelCurveEnds(
        context,
        series.map((s, i) => ({ series: s, style: s.style as SeriesStyle, text: endLabels[i] })),
      ),
    notes: [
      `A_y = f_y/m = ω²·u_y, the yield strength per unit mass whose peak ductility demand u_m/u_y is the target μ, within ${percentLabel(spectra.tolerance)}; μ = 1 is the elastic PSA. Where several strengths give μ, the largest is drawn.`,
      ...offTargetNote(spectra),
      ...zeroPeriodNotes(spectra.periodsS, ` (there A_y = PGA = ${pgaG} g for every μ)`, options.axis),
    ],
  });
}

/**
 * Strength reduction factors (figure b): R_y = f_o/f_y against period for each target ductility,
 * log period and linear R, with the published relations for the same μ as thin labelled curves in
 * the colour of their μ, dashed by relation and named in the legend with their year.
 */
export function ductilityReductionSvg(spectra: DuctilitySpectra, options: DuctilityReductionOptions): string {
  const several = spectra.elastic.length > 1;
  const style = curveStyles(spectra.curves);
  const data = spectra.curves.map(
    (curve): Series => ({
      label: ductilityLabel(curve, several),
      x: spectra.periodsS,
      y: curve.ry,
      // Heavier than the published curves, which carry the dashes; solid unless dashed by damping.
      style: { ...style(curve), dash: several ? style(curve).dash : 'none', widthPx: 1.9 },
    }),
  );
  const colourOf = (r: ReferenceReduction) =>
    style(spectra.curves.find((c) => c.ductility === r.ductility && c.damping === r.damping) ?? r).color;
  // The relations are fits at about 5% damping: drawn once per μ, at 5% where it is drawn.
  const dampings = spectra.elastic.map((e) => e.damping);
  const referenceDamping = dampings.find((z) => Math.abs(z - 0.05) < 1e-12) ?? dampings[0];
  const drawn = options.references.curves.filter((r) => r.damping === referenceDamping);
  const references = drawn.map(
    (r): Series => ({
      label: `${r.label}, μ = ${formatValue(r.ductility)}`,
      x: r.periodsS,
      y: r.ry,
      style: { color: colourOf(r), dash: RELATION_DASH[r.relation], widthPx: REFERENCE_WIDTH_PX },
      legend: false,
      kind: 'reference',
    }),
  );
  const samples = (['newmark-hall', 'nassar-krawinkler'] as const).flatMap((relation): Series[] => {
    const first = drawn.find((r) => r.relation === relation);
    if (first === undefined) return [];
    const sample = { color: '#444444', dash: RELATION_DASH[relation], widthPx: REFERENCE_WIDTH_PX };
    return [{ label: first.label, x: [], y: [], style: sample, kind: 'legend-only' }];
  });
  return lineChart({
    title: 'Strength reduction factor R_y against published R–μ–T relations',
    subtitle: subtitle(spectra.record, spectra),
    x: periodAxisSpec(options.axis),
    y: { title: 'Strength reduction factor R_y = f_o/f_y', scale: 'linear' },
    axes: 'log',
    legendTitle: 'Target ductility:',
    series: [...references, ...data, ...samples],
    rightMarginPx: endLabelMarginPx(data.map((s) => s.label)),
    overlay: (context) =>
      labelCurveEnds(
        context,
        data.map((s) => ({ series: s, style: s.style as SeriesStyle, text: s.label })),
      ),
    notes: [
      "R_y = f_o/f_y: the record's elastic strength f_o = k·u_o over the yield strength f_y that keeps the peak ductility at μ (thick curves, labelled at the right). Thin curves, in the colour of their μ: the published relations for the same μ, dashed by relation.",
      ...(several
        ? [
            `The published relations are drawn at ζ = ${percentLabel(referenceDamping)} only, in the colour of its curves.`,
          ]
        : []),
      ...options.references.notes,
      ...offTargetNote(spectra),
      ...zeroPeriodNotes(spectra.periodsS, ' (there R_y = 1 for every μ)', options.axis),
    ],
  });
}

/** A given strength as a label: "R_y = 2" or "A_y = 0.2 g". */
function strengthLabel(strength: { ry: number } | { ayG: number }): string {
  return 'ry' in strength ? `R_y = ${formatValue(strength.ry)}` : `A_y = ${formatValue(strength.ayG)} g`;
}

/** Ductility demand spectra: the peak ductility u_m/u_y against period for each given strength, log–log. */
export function ductilityDemandSvg(
  spectra: DuctilityDemandSpectra,
  options: DuctilityFigureOptions = {},
): string {
  const dampings = [...new Set(spectra.curves.map((c) => c.damping))];
  const strengths = [...new Set(spectra.curves.map((c) => strengthLabel(c.strength)))];
  const series = spectra.curves.map((curve): Series => {
    const label = strengthLabel(curve.strength);
    const style = seriesStyle(strengths.indexOf(label));
    const several = dampings.length > 1;
    return {
      label: several ? `${label}, ζ = ${percentLabel(curve.damping)}` : label,
      x: spectra.periodsS,
      y: curve.ductility,
      style: several ? { ...style, dash: DAMPING_DASHES[dampings.indexOf(curve.damping) % 4] } : style,
    };
  });
  const endLabels = series.map((s) => s.label);
  return lineChart({
    title: 'Ductility demand spectra for given strengths',
    subtitle: subtitle(spectra.record, spectra),
    x: periodAxisSpec(options.axis),
    y: { title: 'Ductility demand μ = u_m/u_y' },
    legendTitle: 'Strength:',
    series,
    rightMarginPx: endLabelMarginPx(endLabels),
    underlay: (context) => markElasticLimit(context),
    overlay: (context) =>
      labelCurveEnds(
        context,
        series.map((s, i) => ({ series: s, style: s.style as SeriesStyle, text: endLabels[i] })),
      ),
    notes: [
      'μ = u_m/u_y, the peak displacement over the yield displacement; below 1 (under the dotted line) the oscillator stays elastic. R_y = f_o/f_y sets u_y = u_o/R_y with u_o the elastic peak; A_y sets u_y = A_y/ω².',
    ],
  });
}

/** The line μ = 1 (the onset of yield), when it lies in the plotted range. */
function markElasticLimit(context: PanelContext): void {
  const { doc, group, y, plot, yDomain } = context;
  if (!(1 >= yDomain[0] && 1 <= yDomain[1])) return;
  const mark = doc.element(group, 'g', { class: 'elastic-limit' });
  const ends = { x1: plot.left, x2: plot.left + plot.width, y1: y(1), y2: y(1) };
  doc.element(mark, 'line', { ...ends, ...MARK_LINE, 'stroke-dasharray': '1 3' });
}

/**
 * The figures of constant-ductility spectra (ductility-ay.svg, ductility-ry.svg) or of ductility
 * demand spectra (ductility-demand.svg), as files.
 */
export function ductilityFigures(
  spectra: DuctilitySpectra,
  options: DuctilityReductionOptions,
): NamedFigure[];
export function ductilityFigures(
  spectra: DuctilityDemandSpectra,
  options?: DuctilityFigureOptions,
): NamedFigure[];
export function ductilityFigures(
  spectra: DuctilitySpectra | DuctilityDemandSpectra,
  options: DuctilityFigureOptions & { references?: ReferenceReductions } = {},
): NamedFigure[] {
  if (!('convention' in spectra))
    return [{ name: 'ductility-demand.svg', svg: ductilityDemandSvg(spectra, options) }];
  return [
    { name: 'ductility-ay.svg', svg: ductilityStrengthSvg(spectra, options) },
    // The overloads give constant-ductility spectra their references.
    { name: 'ductility-ry.svg', svg: ductilityReductionSvg(spectra, options as DuctilityReductionOptions) },
  ];
}
