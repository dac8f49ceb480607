import { scaleLinear } from 'd3-scale';
import { escapeXml, plotBottom, plotLeft, plotRight, plotTop, renderChart } from './simple-chart.js';

export interface HusidFigure {
  recordName: string;
  dtS: number;
  /** Normalised Husid curve, 0 → 1, one value a sample. */
  husid: Float64Array;
  t5S: number;
  t75S: number;
  t95S: number;
  /** Lines describing processing and method, shown under the axes. */
  notes?: string[];
}

/** The Husid curve (normalised Arias intensity against time) with the 5, 75 and 95% levels marked. */
export function husidSvg(figure: HusidFigure): string {
  const n = figure.husid.length;
  const times = Float64Array.from({ length: n }, (_, i) => i * figure.dtS);
  const x = scaleLinear()
    .domain([0, (n - 1) * figure.dtS])
    .range([plotLeft, plotRight]);
  const y = scaleLinear().domain([0, 1]).range([plotBottom, plotTop]);
  const overlay: string[] = [];
  for (const [level, timeS] of [
    [0.05, figure.t5S],
    [0.75, figure.t75S],
    [0.95, figure.t95S],
  ] as const) {
    const py = y(level).toFixed(2);
    const px = x(timeS).toFixed(2);
    overlay.push(
      `<line x1="${plotLeft}" x2="${plotRight}" y1="${py}" y2="${py}" stroke="#8c8c8c" stroke-dasharray="4 3"/>`,
      `<line x1="${px}" x2="${px}" y1="${py}" y2="${plotBottom}" stroke="#8c8c8c" stroke-dasharray="4 3"/>`,
      `<text x="${plotRight - 4}" y="${py}" dy="-0.3em" text-anchor="end" font-size="11" font-family="sans-serif">${escapeXml(`${level * 100}% at ${timeS.toFixed(2)} s`)}</text>`,
    );
  }
  const d595 = figure.t95S - figure.t5S;
  const d575 = figure.t75S - figure.t5S;
  return renderChart({
    title: `Husid curve: ${figure.recordName}`,
    xLabel: 'time, s',
    yLabel: 'normalised Arias intensity',
    x,
    y,
    series: [{ x: times, y: figure.husid, stroke: '#1f4e79', width: 1.6 }],
    overlay: overlay.join('\n'),
    notes: [
      `D5–75 = ${d575.toFixed(2)} s, D5–95 = ${d595.toFixed(2)} s (Trifunac and Brady 1975); Arias intensity by the trapezoidal rule`,
      ...(figure.notes ?? []),
    ],
  });
}
