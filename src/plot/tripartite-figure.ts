import { LENGTH_UNITS, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import type { PanelContext } from './panel.js';
import { type PsaFigureOptions, spectrumChart } from './spectrum-figure.js';
import { HALO } from './styles.js';
import { formatCoordinate } from './svg.js';
import { formatLogValue, logLabelStyle, textWidthPx } from './ticks.js';

const DIAGONAL_COLOUR = '#b8b8b8';
const DIAGONAL_TEXT = '#555555';
const DIAGONAL_PX = 8.5;

/** Diagonal values: decades when the plot spans three or more of them, 1-2-5 steps otherwise. */
export function diagonalValues(low: number, high: number): number[] {
  const steps = Math.log10(high / low) >= 3 ? [1] : [1, 2, 5];
  const values: number[] = [];
  for (let k = Math.floor(Math.log10(low)) - 1; k <= Math.ceil(Math.log10(high)); k++) {
    for (const s of steps) {
      const v = Number((s * 10 ** k).toPrecision(6));
      if (v > low && v < high) values.push(v);
    }
  }
  return values;
}

type Segment = { t0: number; v0: number; t1: number; v1: number };

/**
 * The four-way logarithmic plot (Newmark and Hall 1982, "Earthquake Spectra and Design", ch. 2):
 * PSV against T on log–log axes with diagonal grids of constant SD (PSV = 2π·SD/T, falling at
 * slope −1) and constant PSA (PSV = PSA·T/(2π), rising at slope +1), each diagonal labelled.
 * Overlays are given as PSA in g and drawn as PSV. With `axis: 'frequency'` the same plot is drawn
 * against f = 1/T: a log–log plot of PSV stays four-way, its diagonals mirrored.
 */
export function tripartiteFigure(spectrum: Spectrum, options: PsaFigureOptions = {}): string {
  const unit = options.lengthUnit ?? 'm';
  const perLength = 1 / LENGTH_UNITS[unit];
  const gInUnit = STANDARD_GRAVITY_MS2 * perLength;
  return spectrumChart(spectrum, options, {
    title: 'Four-way logarithmic response spectrum (PSV, SD, PSA)',
    y: { title: `Pseudo-velocity PSV (${unit}/s)` },
    axes: 'log',
    heightPx: 430,
    quantity: 'psvMS',
    scale: perLength,
    overlayY: (psaG, t) => (psaG * gInUnit * t) / (2 * Math.PI),
    underlay: (context) => drawDiagonals(context, unit, gInUnit),
    note:
      options.axis === 'frequency'
        ? `Against frequency f = 1/T the diagonals turn over: rising to the right are constant SD (${unit}), PSV = 2π·f·SD; falling to the right are constant PSA (g), PSV = PSA/(2π·f). After Newmark and Hall (1982), drawn against frequency.`
        : `Diagonals falling to the right are constant SD (${unit}), PSV = 2π·SD/T; diagonals rising to the right are constant PSA (g), PSV = PSA·T/(2π). After Newmark and Hall (1982).`,
  });
}

/**
 * The SD and PSA diagonals, each labelled where it crosses the fewest curves and other labels. They
 * are worked out in periods (the context's x and xDomain are in the data's units), so on a
 * frequency axis the same lines are drawn, mirrored.
 */
function drawDiagonals(context: PanelContext, unit: string, gInUnit: number): void {
  const { doc, group, x, y } = context;
  const [tLow, tHigh] = context.xDomain;
  const [vLow, vHigh] = context.yDomain;
  const occupied: [number, number][] = [];
  for (const s of context.spec.series) {
    for (let i = 0; i < s.x.length; i++) {
      if (s.x[i] > 0 && s.y[i] > 0) occupied.push([x(s.x[i]), y(s.y[i])]);
      if (i > 0 && s.x[i - 1] > 0 && s.y[i - 1] > 0 && s.x[i] > 0 && s.y[i] > 0) {
        const [ax, ay, bx, by] = [x(s.x[i - 1]), y(s.y[i - 1]), x(s.x[i]), y(s.y[i])];
        const steps = Math.ceil(Math.hypot(bx - ax, by - ay) / 4);
        for (let k = 1; k < steps; k++)
          occupied.push([ax + ((bx - ax) * k) / steps, ay + ((by - ay) * k) / steps]);
      }
    }
  }
  const twoPi = 2 * Math.PI;
  const families = [
    {
      kind: 'sd',
      unit,
      // PSV = 2π·SD/T: SD runs from vLow·tLow/2π to vHigh·tHigh/2π over the plot.
      values: diagonalValues((vLow * tLow) / twoPi, (vHigh * tHigh) / twoPi),
      segment(value: number): Segment | undefined {
        const c = twoPi * value;
        const t0 = Math.max(tLow, c / vHigh);
        const t1 = Math.min(tHigh, c / vLow);
        return t0 < t1 ? { t0, v0: c / t0, t1, v1: c / t1 } : undefined;
      },
    },
    {
      kind: 'psa',
      unit: 'g',
      // PSV = PSA·g·T/2π: PSA (g) runs from 2π·vLow/(g·tHigh) to 2π·vHigh/(g·tLow).
      values: diagonalValues((twoPi * vLow) / (gInUnit * tHigh), (twoPi * vHigh) / (gInUnit * tLow)),
      segment(value: number): Segment | undefined {
        const k = (value * gInUnit) / twoPi;
        const t0 = Math.max(tLow, vLow / k);
        const t1 = Math.min(tHigh, vHigh / k);
        return t0 < t1 ? { t0, v0: k * t0, t1, v1: k * t1 } : undefined;
      },
    },
  ];
  const lines = doc.element(group, 'g', { class: 'diagonals', fill: 'none' });
  const labels: { cx: number; cy: number; half: number }[] = [];
  for (const family of families) {
    // One label style for the family, as on an axis: no 10⁻⁴ m beside 0.001 m.
    const style = logLabelStyle([Math.min(...family.values), Math.max(...family.values)]);
    for (const value of family.values) {
      const segment = family.segment(value);
      if (!segment) continue;
      const ends = [x(segment.t0), y(segment.v0), x(segment.t1), y(segment.v1)];
      // Left end first, so that the label reads left to right on a frequency axis too.
      const [ax, ay, bx, by] = ends[0] <= ends[2] ? ends : [ends[2], ends[3], ends[0], ends[1]];
      const length = Math.hypot(bx - ax, by - ay);
      const text = `${formatLogValue(value, style)} ${family.unit}`;
      const half = textWidthPx(text, DIAGONAL_PX) / 2 + 3;
      const item = doc.element(lines, 'g', {
        class: `diagonal ${family.kind}`,
        [`data-${family.kind}`]: value,
        'data-unit': family.unit,
      });
      doc.element(item, 'path', {
        d: `M${formatCoordinate(ax)},${formatCoordinate(ay)}L${formatCoordinate(bx)},${formatCoordinate(by)}`,
        stroke: DIAGONAL_COLOUR,
        'stroke-width': 0.7,
      });
      if (length < 2 * half + 8) continue;
      const angle = (Math.atan2(by - ay, bx - ax) * 180) / Math.PI;
      const spot = chooseSpot([ax, ay, bx, by], length, half, occupied, labels);
      const cx = ax + ((bx - ax) * spot) / length;
      const cy = ay + ((by - ay) * spot) / length;
      labels.push({ cx, cy, half });
      doc.text(item, text, {
        x: 0,
        y: 0,
        dy: '0.35em',
        transform: `translate(${formatCoordinate(cx)},${formatCoordinate(cy)}) rotate(${formatCoordinate(angle)})`,
        'text-anchor': 'middle',
        'font-size': DIAGONAL_PX,
        fill: DIAGONAL_TEXT,
        ...HALO,
        'stroke-width': 3,
      });
    }
  }
}

/** Distance along the segment for a label's centre, away from curves and other labels if it can be. */
function chooseSpot(
  [ax, ay, bx, by]: readonly number[],
  length: number,
  half: number,
  occupied: readonly [number, number][],
  placed: readonly { cx: number; cy: number; half: number }[],
): number {
  const ux = (bx - ax) / length;
  const uy = (by - ay) / length;
  const candidates = [0.5, 0.15, 0.85, 0.3, 0.7, 0.4, 0.6, 0.2, 0.8, 0.1, 0.9, 0.05, 0.95].map((f) =>
    Math.min(length - half - 4, Math.max(half + 4, f * length)),
  );
  let best = candidates[0];
  let bestScore = Number.POSITIVE_INFINITY;
  for (const c of candidates) {
    let score = 0;
    for (let s = -half; s <= half; s += 3) {
      const px = ax + ux * (c + s);
      const py = ay + uy * (c + s);
      for (const [ox, oy] of occupied) if (Math.abs(ox - px) < 6 && Math.abs(oy - py) < 6) score += 1;
      for (const p of placed) if (Math.hypot(p.cx - px, p.cy - py) < p.half + 4) score += 5;
    }
    if (score < bestScore) {
      bestScore = score;
      best = c;
    }
    if (score === 0) break;
  }
  return best;
}
