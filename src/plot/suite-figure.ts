import { area } from 'd3-shape';
import type { SuiteCurve } from '../batch/statistics.js';
import type { SuiteCheck } from '../batch/suite-check.js';
import { lineChart } from './line-chart.js';
import type { PanelContext, Series } from './panel.js';
import { type PeriodAxis, periodAxisSpec } from './period-axis.js';
import { PSA_AXIS } from './spectrum-figure.js';
import { MARK_LABEL, MARK_LINE, type SeriesStyle } from './styles.js';
import { formatValue, percentLabel, zeroPeriodNotes } from './text.js';

export interface SuiteFigureInput {
  periodsS: readonly number[];
  /** The damping ratio drawn. */
  damping: number;
  /** Each record's PSA, g, at that damping (scaled when `scaled`). */
  members: readonly { name: string; psaG: readonly number[] }[];
  /** The suite's statistics at that damping. */
  curve: SuiteCurve;
  scaled: boolean;
  /** The target at the grid periods, and (to draw) at the periods of drawnTargetCurve. */
  target?: {
    description: string;
    psaG: readonly (number | null)[];
    curve?: { periodsS: readonly number[]; psaG: readonly number[] };
  };
  check?: SuiteCheck;
  /** How the oscillators were solved, one line. */
  methodDescription: string;
  /** Lines of small print added to the notes (how the statistics and the factors were made). */
  notes?: readonly string[];
  axis?: PeriodAxis;
}

/**
 * Styles told apart without colour: the records thin and pale, the mean black and heavy, the
 * median dark and dashed, the band a pale fill with dotted edges, the target heavy dash-dot and
 * the fraction of it thin and dotted.
 */
const RECORD: SeriesStyle = { color: '#b3b3b3', dash: 'none', widthPx: 0.8 };
const MEAN: SeriesStyle = { color: '#000000', dash: 'none', widthPx: 2.6 };
const MEDIAN: SeriesStyle = { color: '#0072B2', dash: '7 3', widthPx: 1.7 };
const BAND_FILL = '#56B4E9';
const BAND_EDGE: SeriesStyle = { color: '#3d8fc0', dash: 'none', widthPx: 0.5 };
const TARGET: SeriesStyle = { color: '#D55E00', dash: '10 3 2 3', widthPx: 2.2 };
const FRACTION: SeriesStyle = { color: '#D55E00', dash: '2 2', widthPx: 1.3 };
/** The check range: a grey veil that lets the grid show through. */
const RANGE_FILL = { fill: '#000000', 'fill-opacity': 0.07 } as const;

/** A number for the figure's text: four significant figures. */
const n4 = (value: number) => formatValue(value);

/**
 * A suite's PSA spectra at one damping ratio: each record thin, the mean and the median bold, the
 * band median·exp(±σ_ln) shaded, and with a target, the target, the fraction of it the check asks
 * for and the check range shaded, its least ratio marked; log–log, against period or frequency.
 */
export function suiteFigure(input: SuiteFigureInput): string {
  const { periodsS, curve, check, target } = input;
  const nonNull = (values: readonly (number | null)[]) => values.map((v) => (v === null ? Number.NaN : v));
  const count = input.members.length;
  const series: Series[] = input.members.map((m) => ({
    label: m.name,
    x: periodsS,
    y: m.psaG,
    style: RECORD,
    legend: false,
    kind: 'record',
  }));
  series.push(
    {
      label: `each record (${count})${input.scaled ? ', scaled' : ''}`,
      x: [],
      y: [],
      style: RECORD,
      kind: 'legend-only',
    },
    {
      label: 'band edge',
      x: periodsS,
      y: nonNull(curve.p16_psa_g),
      style: BAND_EDGE,
      legend: false,
      kind: 'band-edge',
    },
    {
      label: 'band edge',
      x: periodsS,
      y: nonNull(curve.p84_psa_g),
      style: BAND_EDGE,
      legend: false,
      kind: 'band-edge',
    },
    {
      label: 'median·exp(±σ_ln)',
      x: [],
      y: [],
      style: { ...BAND_EDGE, color: BAND_FILL, dash: 'none', widthPx: 7 },
      kind: 'legend-only',
    },
    { label: 'median', x: periodsS, y: nonNull(curve.median_psa_g), style: MEDIAN, kind: 'median' },
    { label: 'mean', x: periodsS, y: curve.mean_psa_g, style: MEAN, kind: 'mean' },
  );
  if (target !== undefined) {
    const drawn = target.curve ?? { periodsS, psaG: nonNull(target.psaG) };
    series.push({ label: 'target', x: drawn.periodsS, y: drawn.psaG, style: TARGET, kind: 'target' });
    if (check !== undefined) {
      series.push({
        label: `${n4(check.fraction)} × target`,
        x: drawn.periodsS,
        y: drawn.psaG.map((v) => v * check.fraction),
        style: FRACTION,
        kind: 'fraction',
      });
      series.push({
        label: 'check range',
        x: [],
        y: [],
        style: { color: '#e0e0e0', dash: 'none', widthPx: 7 },
        kind: 'legend-only',
      });
    }
  }
  const subtitle = [
    `Suite of ${count} record${count === 1 ? '' : 's'}${input.scaled ? ', each amplitude-scaled to the target' : ', as read and processed'}; damping ζ = ${percentLabel(input.damping)}`,
    recordsLine(input.members.map((m) => m.name)),
    `Method: ${input.methodDescription}`,
  ];
  if (target !== undefined) subtitle.push(`Target: ${target.description}`);
  if (check !== undefined) subtitle.push(checkLine(check));
  const notes = [
    'Mean: arithmetic mean of the records’ PSA; median and band: log-normal fit, median = exp(m), band exp(m ± σ_ln) with m and σ_ln the mean and sample standard deviation of ln PSA.',
    ...(input.notes ?? []),
    ...zeroPeriodNotes(periodsS, ' (there PSA is the PGA)', input.axis),
  ];
  return lineChart({
    title: `Suite spectra: each record, mean, median and ±1σ band${target ? ' against the target' : ''}, PSA`,
    subtitle,
    x: periodAxisSpec(input.axis),
    y: PSA_AXIS,
    series,
    notes,
    underlay: (context) => {
      if (check !== undefined) shadeRange(context, check);
      shadeBand(context, periodsS, curve);
    },
    overlay: check === undefined ? undefined : (context) => markWorst(context, check, curve.mean_psa_g),
  });
}

/** "Records: a, b, c", cut after about two lines with the number left out. */
export function recordsLine(names: readonly string[], maxChars = 200): string {
  let line = 'Records:';
  for (const [i, name] of names.entries()) {
    const rest = names.length - i;
    if (i > 0 && line.length + name.length + 2 > maxChars) return `${line} and ${rest} more`;
    line += `${i === 0 ? ' ' : ', '}${name}`;
  }
  return line;
}

/** The check's result in one line: pass or fail, the range, the least ratio and where. */
export function checkLine(check: SuiteCheck): string {
  const [from, to] = check.rangeS;
  return `Check (preliminary): ${check.pass ? 'PASS' : 'FAIL'}, mean ≥ ${n4(check.fraction)} × target from ${n4(from)} to ${n4(to)} s (${check.periodCount} grid periods); least mean/target ${n4(check.worstRatio)} at T = ${n4(check.worstPeriodS)} s`;
}

/** The check range shaded over the whole height, its ends marked and named at the top. */
function shadeRange(context: PanelContext, check: SuiteCheck): void {
  const { doc, group, x, plot, xDomain } = context;
  const from = Math.max(check.rangeS[0], xDomain[0]);
  const to = Math.min(check.rangeS[1], xDomain[1]);
  if (!(to > from)) return;
  const [a, b] = [x(from), x(to)].sort((p, q) => p - q);
  const mark = doc.element(group, 'g', { class: 'check-range', 'data-from-s': from, 'data-to-s': to });
  doc.element(mark, 'rect', { x: a, y: plot.top, width: b - a, height: plot.height, ...RANGE_FILL });
  for (const px of [a, b])
    doc.element(mark, 'line', { x1: px, x2: px, y1: plot.top, y2: plot.top + plot.height, ...MARK_LINE });
}

/** The band between median·exp(−σ) and median·exp(+σ), where both are defined. */
function shadeBand(context: PanelContext, periodsS: readonly number[], curve: SuiteCurve): void {
  const { doc, group, x, y } = context;
  const indices = periodsS.map((_, i) => i);
  const low = curve.p16_psa_g;
  const high = curve.p84_psa_g;
  const path = area<number>()
    .defined((i) => periodsS[i] > 0 && low[i] !== null && high[i] !== null && (low[i] as number) > 0)
    .x((i) => x(periodsS[i]))
    .y0((i) => y(low[i] as number))
    .y1((i) => y(high[i] as number))
    .digits(2)(indices);
  doc.element(group, 'path', {
    class: 'band',
    d: path ?? '',
    fill: BAND_FILL,
    'fill-opacity': 0.28,
    stroke: 'none',
  });
}

/** A ring on the mean where its ratio to the target is least, with the ratio beside it. */
function markWorst(context: PanelContext, check: SuiteCheck, meanPsaG: readonly number[]): void {
  const { doc, group, x, y, plot } = context;
  const i = Array.from(context.spec.series[0]?.x ?? []).indexOf(check.worstPeriodS);
  const value = i >= 0 ? meanPsaG[i] : Number.NaN;
  if (!(value > 0) || !(check.worstPeriodS > 0)) return;
  const cx = x(check.worstPeriodS);
  const cy = y(value);
  const mark = doc.element(group, 'g', { class: 'worst-ratio', 'data-ratio': check.worstRatio });
  doc.element(mark, 'circle', { cx, cy, r: 4.5, fill: 'none', stroke: '#000000', 'stroke-width': 1.4 });
  // Under the ring, at the foot of the frame, where the spectra rarely reach; a leader joins them.
  const text = `least mean/target ${n4(check.worstRatio)} at ${n4(check.worstPeriodS)} s`;
  const half = (text.length * 9 * 0.55) / 2;
  const tx = Math.min(Math.max(cx, plot.left + half + 4), plot.left + plot.width - half - 4);
  const ty = plot.top + plot.height - 6;
  if (ty - 12 > cy + 5)
    doc.element(mark, 'path', {
      d: `M${cx},${cy + 5}L${cx},${ty - 12}`,
      ...MARK_LINE,
      'stroke-dasharray': '2 2',
      fill: 'none',
    });
  doc.text(mark, text, { x: tx, y: ty, 'text-anchor': 'middle', ...MARK_LABEL, 'font-weight': 600 });
}
