import type { FloorSpectrumSet } from '../spectrum/floor-set.js';
import { renderFigure } from './figure.js';
import { markBuildingPeriod } from './floor-figure.js';
import type { PanelContext, PanelSpec, Series } from './panel.js';
import { type PeriodAxis, periodAxisSpec } from './period-axis.js';
import { inG, PSA_AXIS } from './spectrum-figure.js';
import { MARK_LABEL, type SeriesStyle, seriesStyle } from './styles.js';
import { methodLine, percentLabel, processingLines, recordLine, zeroPeriodNotes } from './text.js';

export interface FloorSetFigureInput {
  set: FloorSpectrumSet;
  /** Each record's label, in the order of `set.members` (recordLabels). */
  labels: readonly string[];
  building: { periodS: number; damping: number; modalFactor: number };
  methodDescription: string;
  /** The horizontal axis: period T (default) or frequency f = 1/T. */
  axis?: PeriodAxis;
}

/** The mean dashed and the envelope bold, both near-black so that the records keep the colours. */
const MEAN_STYLE: SeriesStyle = { color: '#333333', dash: '7 3', widthPx: 1.8 };
const ENVELOPE_STYLE: SeriesStyle = { color: '#111111', dash: 'none', widthPx: 2.8 };

/** A record's thin solid curve in its colour (the palette's black left to the envelope). */
const recordStyle = (i: number): SeriesStyle => ({
  color: seriesStyle(i % 6).color,
  dash: 'none',
  widthPx: 1.1,
});

/**
 * The floor PSA spectra of several ground records through one building: each record's thin, their
 * mean dashed and their envelope bold, log–log, one panel per damping ratio, the building period
 * marked.
 */
export function floorSetFigure(input: FloorSetFigureInput): string {
  const { set, labels, building: b } = input;
  const many = set.envelope.curves.length > 1;
  const panels = set.envelope.curves.map((envelope, d): PanelSpec => {
    const legend = d === 0;
    const series: Series[] = [
      ...set.members.map(
        (m, i): Series => ({
          label: labels[i],
          x: set.periodsS,
          y: inG(m.spectrum.curves[d].psaMS2),
          style: recordStyle(i),
          legend,
        }),
      ),
      {
        label: `mean of ${set.members.length}`,
        x: set.periodsS,
        y: inG(set.mean.curves[d].psaMS2),
        style: MEAN_STYLE,
        legend,
        kind: 'mean',
      },
      {
        label: 'envelope',
        x: set.periodsS,
        y: inG(envelope.psaMS2),
        style: ENVELOPE_STYLE,
        legend,
        kind: 'envelope',
      },
    ];
    const last = d === set.envelope.curves.length - 1;
    return {
      heightPx: many ? 230 : 360,
      gapAbovePx: d === 0 ? 0 : 8,
      x: periodAxisSpec(input.axis),
      y: PSA_AXIS,
      series,
      xLabels: last,
      underlay: (context) => markBuildingPeriod(context, b.periodS, input.axis),
      overlay: many ? (context) => labelDamping(context, envelope.damping) : undefined,
    };
  });
  const subtitle = [
    ...set.grounds.flatMap((r, i) => [
      recordLine(`Ground record ${i + 1}`, r),
      ...processingLines(r.processing).map((line) => `  ${line}`),
    ]),
    `Building, one mode: T_b = ${b.periodS} s, ζ_b = ${percentLabel(b.damping)}, Γφ = ${b.modalFactor}`,
    methodLine(input.methodDescription, set.envelope.curves, 'component damping'),
  ];
  const broadened =
    set.broadening === null
      ? 'Peaks not broadened.'
      : `Peaks broadened on each record's floor spectrum before the mean and the envelope were taken: the value at T is the largest over [T(1−b), T/(1−b)], b = ${set.broadening} (US NRC Regulatory Guide 1.122, Rev. 1 (1978)).`;
  const notes = [
    "Floor absolute acceleration a_g + Γφ·q'' of the building's fundamental mode, for each ground record; higher modes, soil–structure interaction, nonlinear building response and the equipment's feedback on the floor are not represented.",
    broadened,
    `Mean: the arithmetic mean of the ${set.members.length} floor spectra at each period; envelope: the largest of them at each period.`,
    ...zeroPeriodNotes(set.periodsS, ' (there PSA is the floor PGA)', input.axis),
  ];
  return renderFigure({
    title: `Floor response spectra of ${set.members.length} records: each, their mean and their envelope, PSA`,
    subtitle,
    panels,
    notes,
  });
}

/** The damping ratio of a panel, at its top left inside the frame. */
function labelDamping(context: PanelContext, damping: number): void {
  const { doc, group, plot } = context;
  const at = { x: plot.left + 6, y: plot.top + 14 };
  doc.text(group, `ζ = ${percentLabel(damping)}`, {
    class: 'panel-label',
    ...at,
    ...MARK_LABEL,
    'font-size': 10,
  });
}
