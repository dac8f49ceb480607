import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import { clearLabelSpot, spotsBesideMark } from './label-spot.js';
import { lineChart } from './line-chart.js';
import type { PanelContext, Series } from './panel.js';
import { type PeriodAxis, periodAxisSpec, periodLabel } from './period-axis.js';
import { inG, PSA_AXIS } from './spectrum-figure.js';
import { DAMPING_DASHES, MARK_LABEL, MARK_LINE, type SeriesStyle } from './styles.js';
import {
  formatValue,
  methodLine,
  percentLabel,
  processingLines,
  recordLine,
  zeroPeriodNotes,
} from './text.js';
import { textWidthPx } from './ticks.js';

export interface FloorFigureInput {
  /** The ground record's spectrum. */
  ground: Spectrum;
  /** The floor spectrum as it is reported (broadened when asked). */
  floor: Spectrum;
  /** The floor spectrum before broadening, when it was broadened. */
  unbroadened?: Spectrum;
  /** The broadening fraction b, when broadened. */
  broadening?: number | null;
  building: { periodS: number; damping: number; modalFactor: number };
  methodDescription: string;
  /** The horizontal axis: period T (default) or frequency f = 1/T. */
  axis?: PeriodAxis;
}

/**
 * The in-structure (floor) PSA spectrum against the ground spectrum it came from, and the floor
 * spectrum before peak broadening when it was broadened; log–log, with the building period marked,
 * against period or frequency.
 */
export function floorFigure(input: FloorFigureInput): string {
  const { ground, floor } = input;
  const unbroadened = input.broadening != null ? input.unbroadened : undefined;
  const series: Series[] = [];
  floor.curves.forEach((curve, d) => {
    const dash = DAMPING_DASHES[d % DAMPING_DASHES.length];
    const suffix = floor.curves.length > 1 ? `, ζ = ${percentLabel(curve.damping)}` : '';
    const add = (label: string, spectrum: Spectrum, style: SeriesStyle) =>
      series.push({ label: label + suffix, x: spectrum.periodsS, y: inG(spectrum.curves[d].psaMS2), style });
    add(unbroadened ? 'floor, broadened' : 'floor', floor, { color: '#D55E00', dash, widthPx: 2 });
    const thin = { color: '#A8558A', dash: d === 0 ? '3 2' : dash, widthPx: 1.2 };
    if (unbroadened) add('floor, not broadened', unbroadened, thin);
    add('ground', ground, { color: '#0072B2', dash, widthPx: 1.4 });
  });
  const b = input.building;
  const r = ground.record;
  const subtitle = [
    recordLine('Ground record', r),
    ...processingLines(r.processing),
    `Building, one mode: T_b = ${b.periodS} s, ζ_b = ${percentLabel(b.damping)}, Γφ = ${b.modalFactor}; floor PGA = ${formatValue(floor.record.pgaMS2 / STANDARD_GRAVITY_MS2)} g`,
    methodLine(input.methodDescription, floor.curves, 'component damping'),
  ];
  const notes = [
    "Floor absolute acceleration a_g + Γφ·q'' of the building's fundamental mode; higher modes, soil–structure interaction, nonlinear building response and the equipment's feedback on the floor are not represented.",
    unbroadened
      ? `Peaks broadened: the value at T is the largest over [T(1−b), T/(1−b)], b = ${input.broadening} (US NRC Regulatory Guide 1.122, Rev. 1 (1978)).`
      : 'Peaks not broadened.',
    ...zeroPeriodNotes(
      floor.periodsS,
      ' (there PSA is the peak acceleration, the floor and ground PGA given above)',
      input.axis,
    ),
  ];
  return lineChart({
    title: 'Floor response spectrum against the ground spectrum, PSA',
    subtitle,
    x: periodAxisSpec(input.axis),
    y: PSA_AXIS,
    series,
    notes,
    underlay: (context) => markBuildingPeriod(context, b.periodS, input.axis),
  });
}

/**
 * The building period as a dotted line, labelled beside it where no curve passes (the broadened
 * peak sits on it); the context's x and xDomain are in periods on either axis.
 */
export function markBuildingPeriod(context: PanelContext, periodS: number, axis?: PeriodAxis): void {
  const { doc, group, x, plot, xDomain } = context;
  if (!(periodS >= xDomain[0] && periodS <= xDomain[1])) return;
  const px = x(periodS);
  const mark = doc.element(group, 'g', { class: 'building-period', 'data-period-s': periodS });
  const ends = { x1: px, x2: px, y1: plot.top, y2: plot.top + plot.height };
  doc.element(mark, 'line', { ...ends, ...MARK_LINE, 'stroke-dasharray': '1 3' });
  const text = periodLabel('_b', periodS, axis);
  const size = {
    widthPx: textWidthPx(text, MARK_LABEL['font-size']),
    heightPx: MARK_LABEL['font-size'] * 1.2,
  };
  const spot = clearLabelSpot(context, spotsBesideMark(context, px, 12), size);
  doc.text(mark, text, { x: spot.x, y: spot.y, 'text-anchor': spot.anchor, ...MARK_LABEL });
}
