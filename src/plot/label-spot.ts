import type { PanelContext } from './panel.js';

/** A place for a one-line label, px: its text starts (or ends) at x, its baseline at y. */
export interface LabelSpot {
  x: number;
  y: number;
  anchor: 'start' | 'end';
}

/** A label's box, px: left, top, right, bottom. */
type Box = [number, number, number, number];

/** Room kept between a label and a curve, px. */
const CLEARANCE_PX = 2;

/**
 * The first of `spots` where a label `widthPx` wide and `heightPx` high stays inside the plot
 * and clear of every curve of the panel (the segments between its drawable points) and of the
 * `obstacles` (other marks, segments in px); the first spot when none is clear.
 */
export function clearLabelSpot(
  context: PanelContext,
  spots: readonly LabelSpot[],
  { widthPx, heightPx }: { widthPx: number; heightPx: number },
  obstacles: readonly Segment[] = [],
): LabelSpot {
  const segments = [...curveSegments(context), ...obstacles];
  const { plot } = context;
  const fits = (box: Box) =>
    box[0] >= plot.left &&
    box[2] <= plot.left + plot.width &&
    box[1] >= plot.top &&
    box[3] <= plot.top + plot.height;
  for (const spot of spots) {
    const left = spot.anchor === 'start' ? spot.x : spot.x - widthPx;
    const box: Box = [left, spot.y - heightPx * 0.8, left + widthPx, spot.y + heightPx * 0.2];
    const padded: Box = [
      box[0] - CLEARANCE_PX,
      box[1] - CLEARANCE_PX,
      box[2] + CLEARANCE_PX,
      box[3] + CLEARANCE_PX,
    ];
    if (fits(box) && !segments.some((s) => segmentMeetsBox(s, padded))) return spot;
  }
  return spots[0];
}

/**
 * The spots beside a vertical mark at `px`, right of it then left of it, from the top of the plot
 * down to its bottom in steps of one line.
 */
export function spotsBesideMark(context: PanelContext, px: number, lineHeightPx: number): LabelSpot[] {
  const { top, height } = context.plot;
  const spots: LabelSpot[] = [];
  for (let y = top + lineHeightPx + 2; y <= top + height - 4; y += lineHeightPx) {
    spots.push({ x: px + 4, y, anchor: 'start' }, { x: px - 4, y, anchor: 'end' });
  }
  return spots;
}

/** A straight piece of a line, px: x1, y1, x2, y2. */
export type Segment = [number, number, number, number];

/** Every curve of the panel as segments in px, between consecutive points that can be drawn. */
function curveSegments({ spec, x, y }: PanelContext): Segment[] {
  const out: Segment[] = [];
  const logX = (spec.x.scale ?? 'log') === 'log';
  const logY = (spec.y.scale ?? 'log') === 'log';
  for (const series of spec.series) {
    let previous: [number, number] | null = null;
    const count = Math.min(series.x.length, series.y.length);
    for (let i = 0; i < count; i++) {
      const xv = series.x[i];
      const yv = series.y[i];
      const ok = Number.isFinite(xv) && Number.isFinite(yv) && !(logX && xv <= 0) && !(logY && yv <= 0);
      const point: [number, number] | null = ok ? [x(xv), y(yv)] : null;
      if (point && !(Number.isFinite(point[0]) && Number.isFinite(point[1]))) continue;
      if (point && previous) out.push([previous[0], previous[1], point[0], point[1]]);
      previous = point;
    }
  }
  return out;
}

/** Whether a segment meets a box (Liang and Barsky 1984 clipping: a non-empty clipped part). */
export function segmentMeetsBox([x1, y1, x2, y2]: Segment, [left, top, right, bottom]: Box): boolean {
  const dx = x2 - x1;
  const dy = y2 - y1;
  let t0 = 0;
  let t1 = 1;
  const sides: [number, number][] = [
    [-dx, x1 - left],
    [dx, right - x1],
    [-dy, y1 - top],
    [dy, bottom - y1],
  ];
  for (const [p, q] of sides) {
    if (p === 0) {
      if (q < 0) return false;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return false;
  }
  return true;
}
