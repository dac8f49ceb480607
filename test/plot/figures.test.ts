import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { logSpaced } from '../../src/oscillator/grid.js';
import { historiesFigure } from '../../src/plot/histories-figure.js';
import { lineChart } from '../../src/plot/line-chart.js';
import { psaFigure, psvFigure, sdFigure } from '../../src/plot/spectrum-figure.js';
import { tripartiteFigure } from '../../src/plot/tripartite-figure.js';
import { integrateRecord } from '../../src/record/integrate.js';
import { createRecord } from '../../src/record/record.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { axisFromTicks, handSpectrum, parseSvg, pathVertices } from './helpers.js';

const figures = {
  psa: psaFigure,
  sd: sdFigure,
  psv: psvFigure,
  tripartite: tripartiteFigure,
};

describe('spectrum figures', () => {
  for (const [name, draw] of Object.entries(figures)) {
    it(`${name}: parses as XML and holds one curve per damping ratio`, () => {
      const spectrum = handSpectrum();
      const doc = parseSvg(draw(spectrum));
      expect(doc.documentElement.localName).toBe('svg');
      expect(doc.querySelectorAll('path.curve')).toHaveLength(spectrum.curves.length);
      expect(doc.documentElement.getAttribute('font-family')).toBe('sans-serif');
    });

    it(`${name}: carries the caution, the record name, the method and the damping ratios`, () => {
      const doc = parseSvg(draw(handSpectrum('invented pier 7')));
      const caution = [...doc.querySelectorAll('g.caution text')].map((t) => t.textContent).join(' ');
      expect(caution).toBe(CAUTION);
      const header = doc.querySelector('g.header')?.textContent ?? '';
      expect(header).toContain('invented pier 7');
      expect(header).toContain('newmark-average');
      expect(header).toContain('2%, 5%, 10%');
    });

    it(`${name}: escapes a record name holding <, & and quotes`, () => {
      const nasty = `pier <7> & "north" 'east'`;
      const text = draw(handSpectrum(nasty));
      expect(text).not.toContain('<7>');
      expect(text).toContain('pier &lt;7&gt; &amp; "north"');
      // Parses back to the same name (XML 1.0 §2.4, character data and markup).
      expect(parseSvg(text).querySelector('g.header')?.textContent).toContain(nasty);
    });
  }

  it('a known (T, PSA) point lands on the pixel the axes give (log–log)', () => {
    const spectrum = handSpectrum();
    const doc = parseSvg(psaFigure(spectrum));
    const x = axisFromTicks(doc, 0, 'x', 'log');
    const y = axisFromTicks(doc, 0, 'y', 'log');
    const d = doc.querySelectorAll('path.curve')[1].getAttribute('d') ?? '';
    const vertices = pathVertices(d);
    // T = 0 cannot go on a log axis, so vertex k is period k + 1.
    expect(vertices).toHaveLength(spectrum.periodsS.length - 1);
    const p = 4; // T = 0.5 s
    const psaG = spectrum.curves[1].psaMS2[p] / STANDARD_GRAVITY_MS2;
    expect(vertices[p - 1][0]).toBeCloseTo(x(0.5), 1);
    expect(vertices[p - 1][1]).toBeCloseTo(y(psaG), 1);
    expect(doc.querySelector('g.notes')?.textContent).toContain('T = 0 s');
  });

  it('linear axes keep T = 0 and start the period axis there', () => {
    const spectrum = handSpectrum();
    const doc = parseSvg(sdFigure(spectrum, { axes: 'linear', lengthUnit: 'cm' }));
    const x = axisFromTicks(doc, 0, 'x', 'linear');
    const y = axisFromTicks(doc, 0, 'y', 'linear');
    const vertices = pathVertices(doc.querySelector('path.curve')?.getAttribute('d') ?? '');
    expect(vertices).toHaveLength(spectrum.periodsS.length);
    expect(vertices[0][0]).toBeCloseTo(x(0), 1);
    expect(vertices[6][1]).toBeCloseTo(y(spectrum.curves[0].sdM[6] * 100), 1);
    expect(doc.querySelector('.y-title')?.textContent).toBe('Relative displacement SD (cm)');
  });

  it('no curve runs beyond the period grid', () => {
    const spectrum = handSpectrum();
    const doc = parseSvg(psvFigure(spectrum));
    const x = axisFromTicks(doc, 0, 'x', 'log');
    for (const path of doc.querySelectorAll('path.curve')) {
      const xs = pathVertices(path.getAttribute('d') ?? '').map((v) => v[0]);
      expect(Math.min(...xs)).toBeCloseTo(x(0.05), 1);
      expect(Math.max(...xs)).toBeCloseTo(x(4), 1);
    }
  });

  it('overlays are drawn as extra series in the PSA and four-way plots', () => {
    const overlays = [{ label: 'invented target', periodsS: [0.1, 1, 2], psaG: [0.5, 0.5, 0.25] }];
    for (const draw of [psaFigure, tripartiteFigure]) {
      const doc = parseSvg(draw(handSpectrum(), { overlays }));
      expect(doc.querySelectorAll('path.overlay')).toHaveLength(1);
      expect(doc.querySelector('g.legend')?.textContent).toContain('invented target');
    }
  });
});

/** A labelled diagonal value back in SI: "0.01 m" → 0.01, "2×10⁻⁴ m" → 2e-4, "10⁻⁵ g" → 1e-5. */
function labelValue(text: string): number {
  const number = text.split(' ')[0];
  const digits = '⁰¹²³⁴⁵⁶⁷⁸⁹';
  const power = /^(?:([\d.]+)×)?10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)$/.exec(number);
  if (!power) return Number(number);
  const exponent = Number([...power[2]].map((c) => (c === '⁻' ? '-' : String(digits.indexOf(c)))).join(''));
  return Number(power[1] ?? 1) * 10 ** exponent;
}

describe('four-way logarithmic plot', () => {
  const record = createRecord({
    name: 'invented decaying sine',
    dtS: 0.01,
    accelMS2: Float64Array.from(
      { length: 1500 },
      (_, i) => 2 * Math.sin(2 * Math.PI * 1.3 * i * 0.01) * Math.exp(-i / 600),
    ),
  });
  const spectrum = responseSpectrum(record, { periodsS: logSpaced(0.02, 5, 60), dampings: [0.05] });

  for (const unit of ['m', 'cm'] as const) {
    it(`the SD and PSA diagonals satisfy PSV = 2π·SD/T and PSV = PSA·T/(2π) at their labels (${unit})`, () => {
      // Newmark and Hall (1982), ch. 2: the pseudo relations of an undamped-form oscillator.
      const doc = parseSvg(tripartiteFigure(spectrum, { lengthUnit: unit }));
      const x = axisFromTicks(doc, 0, 'x', 'log');
      const y = axisFromTicks(doc, 0, 'y', 'log');
      const toT = (px: number) => 10 ** (Math.log10(0.1) + (px - x(0.1)) / (x(1) - x(0.1)));
      const toV = (py: number) => 10 ** (Math.log10(1) + (py - y(1)) / (y(10) - y(1)));
      const perMetre = unit === 'm' ? 1 : 100;
      const sd = doc.querySelectorAll('g.diagonal.sd');
      const psa = doc.querySelectorAll('g.diagonal.psa');
      expect(sd.length).toBeGreaterThanOrEqual(3);
      expect(psa.length).toBeGreaterThanOrEqual(3);
      for (const line of sd) {
        const label = line.querySelector('text')?.textContent;
        if (!label) continue;
        expect(label.endsWith(` ${unit}`)).toBe(true);
        const sdValue = labelValue(label);
        for (const [px, py] of pathVertices(line.querySelector('path')?.getAttribute('d') ?? '')) {
          const t = toT(px);
          expect(toV(py) / ((2 * Math.PI * sdValue) / t)).toBeCloseTo(1, 2);
        }
      }
      for (const line of psa) {
        const label = line.querySelector('text')?.textContent;
        if (!label) continue;
        expect(label.endsWith(' g')).toBe(true);
        const psaValue = labelValue(label) * STANDARD_GRAVITY_MS2 * perMetre;
        for (const [px, py] of pathVertices(line.querySelector('path')?.getAttribute('d') ?? '')) {
          const t = toT(px);
          expect(toV(py) / ((psaValue * t) / (2 * Math.PI))).toBeCloseTo(1, 2);
        }
      }
      // The curve itself: PSV at a grid period read back through the same axes.
      const p = 30;
      const vertex = pathVertices(doc.querySelector('path.curve')?.getAttribute('d') ?? '')[p];
      expect(toV(vertex[1]) / (spectrum.curves[0].psvMS[p] * perMetre)).toBeCloseTo(1, 2);
    });
  }
});

describe('time histories', () => {
  it('marks the peaks of acceleration, velocity and displacement of a known motion', () => {
    // a = A sin ωt from rest: v = A(1 − cos ωt)/ω, u = A(t − sin ωt / ω)/ω (closed form).
    const dtS = 0.005;
    const omega = 2 * Math.PI;
    const amplitude = 0.5 * STANDARD_GRAVITY_MS2;
    const n = 801;
    const accelMS2 = Float64Array.from({ length: n }, (_, i) => amplitude * Math.sin(omega * i * dtS));
    // The histories are given by the caller, integrated by the shared rule (src/record/integrate.ts).
    const doc = parseSvg(
      historiesFigure({ name: 'invented <sine> & "test"', dtS, ...integrateRecord({ accelMS2, dtS }) }),
    );
    const peaks = [...doc.querySelectorAll('g.peak')].map((g) => Number(g.getAttribute('data-value')));
    expect(peaks).toHaveLength(3);
    expect(peaks[0]).toBeCloseTo(0.5, 3);
    expect(peaks[1]).toBeCloseTo((2 * amplitude) / omega, 3);
    const tEnd = (n - 1) * dtS;
    expect(peaks[2]).toBeCloseTo((amplitude * tEnd) / omega, 2);
    expect(doc.querySelectorAll('path.history')).toHaveLength(3);
    expect([...doc.querySelectorAll('g.caution text')].map((t) => t.textContent).join(' ')).toBe(CAUTION);
    expect(doc.querySelector('g.header')?.textContent).toContain('invented <sine> & "test"');
    expect(doc.querySelector('g.header')?.textContent).toContain('trapezoidal');
    // Only the bottom panel carries time labels.
    expect(doc.querySelectorAll('g.x-ticks')).toHaveLength(1);
  });
});

describe('lineChart', () => {
  it('draws any series on the axes asked for, with a legend entry each', () => {
    const svg = lineChart({
      title: 'invented figure',
      x: { title: 'x (s)' },
      y: { title: 'y (g)' },
      axes: 'linear',
      series: [
        { label: 'one', x: [0, 1, 2], y: [0, 1, 4] },
        { label: 'two', x: [0, 1, 2], y: [0, 2, 3] },
      ],
    });
    const doc = parseSvg(svg);
    expect(doc.querySelectorAll('path.curve')).toHaveLength(2);
    expect(doc.querySelectorAll('g.legend line.legend-sample')).toHaveLength(2);
    const dashes = [...doc.querySelectorAll('path.curve')].map((p) => p.getAttribute('stroke-dasharray'));
    expect(new Set(dashes).size).toBe(2);
  });
});
