import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { historiesFigure } from '../../src/plot/histories-figure.js';
import { integrateRecord } from '../../src/record/integrate.js';
import { createRecord } from '../../src/record/record.js';
import { axisFromTicks, parseSvg, pathVertices } from './helpers.js';
import { NASTY, newFigures } from './new-figures.js';

const figures = newFigures();

/** The drawn curves of a figure: data curves and overlays (reference lines are counted apart). */
function curvePaths(doc: Document, name: string): Element[] {
  if (name === 'anchor-plan') return [...doc.querySelectorAll('g.anchor circle')];
  return [...doc.querySelectorAll('g.curves path')].filter(
    (p) => !['reference', 'legend-only'].includes(p.getAttribute('class') ?? ''),
  );
}

describe('the figures of design, damping, rotd, floor, info and anchor', () => {
  for (const [name, { svg, curves }] of Object.entries(figures)) {
    it(`${name}: parses as XML (XML 1.0 well-formedness), one path per curve, the caution in the footer`, () => {
      const doc = parseSvg(svg);
      expect(doc.documentElement.localName).toBe('svg');
      expect(doc.documentElement.getAttribute('font-family')).toBe('sans-serif');
      expect(doc.documentElement.getAttribute('width')).toBe('640');
      expect(curvePaths(doc, name)).toHaveLength(curves);
      const caution = [...doc.querySelectorAll('g.caution text')].map((t) => t.textContent).join(' ');
      expect(caution).toBe(CAUTION);
    });

    it(`${name}: escapes a name holding <, &, and quotes and reads it back unchanged`, () => {
      if (name === 'design') return; // no record name: the spectrum's own description
      expect(svg).not.toContain('<7>');
      expect(svg).toContain('&lt;7&gt; &amp;');
      expect(parseSvg(svg).querySelector('g.header')?.textContent).toContain(NASTY);
    });
  }

  it('design: T = 0 is left off the log axis and its PSA stated; PSA = S_DS on the plateau (ASCE/SEI 7-16 §11.4.6)', () => {
    const doc = parseSvg(figures.design.svg);
    expect(doc.querySelector('g.notes')?.textContent).toContain('T = 0 s');
    expect(doc.querySelector('g.notes')?.textContent).toContain('PSA = 0.4 g'); // 0.4 S_DS at T = 0
    const y = axisFromTicks(doc, 0, 'y', 'log');
    const x = axisFromTicks(doc, 0, 'x', 'log');
    const vertices = pathVertices(doc.querySelector('path.curve')?.getAttribute('d') ?? '');
    // A vertex between T0 = 0.12 s and TS = 0.6 s sits at S_DS = 1 g.
    const plateau = vertices.filter(([px]) => px > x(0.15) && px < x(0.5));
    expect(plateau.length).toBeGreaterThan(3);
    for (const [, py] of plateau) expect(py).toBeCloseTo(y(1), 0);
  });

  it('damping: the published ratios are horizontal lines at EC8 η(ξ)/η(5%) = √(10/(5+ξ))/1 (EN 1998-1 Eq. 3.6)', () => {
    const doc = parseSvg(figures.damping.svg);
    const references = [...doc.querySelectorAll('path.reference')];
    // 2% and 10%: EC8 and three Newmark–Hall ratios each.
    expect(references).toHaveLength(8);
    const y = axisFromTicks(doc, 1, 'y', 'linear');
    const heights = references.map((p) => pathVertices(p.getAttribute('d') ?? '').map(([, py]) => py));
    for (const h of heights) expect(h[0]).toBeCloseTo(h[1], 6);
    for (const xi of [2, 10]) {
      const eta = Math.sqrt(10 / (5 + xi));
      expect(heights.some((h) => Math.abs(h[0] - y(eta)) < 0.02)).toBe(true);
    }
    const labels = [...doc.querySelectorAll('g.reference-labels text')].map((t) => t.textContent);
    expect(labels).toContain(`10%: EC8 η ${Math.sqrt(10 / 15).toFixed(2)}`);
    expect(doc.querySelectorAll('g.panel')).toHaveLength(2);
  });

  it('histories: a 40,000-sample record draws under 200 kB and keeps its peak exactly', () => {
    const n = 40000;
    const accelMS2 = Float64Array.from({ length: n }, (_, i) => Math.sin(i / 9) * (i === 23456 ? 3 : 1));
    const record = createRecord({ name: 'invented long record', dtS: 0.005, accelMS2 });
    const svg = historiesFigure({ ...record, ...integrateRecord(record) });
    expect(svg.length).toBeLessThan(200_000);
    const doc = parseSvg(svg);
    const peak = Number(doc.querySelector('g.peak')?.getAttribute('data-value'));
    expect(peak).toBeCloseTo((3 * Math.sin(23456 / 9)) / STANDARD_GRAVITY_MS2, 12);
    // The drawn acceleration path reaches the pixel of the peak (axis read back from the ticks).
    const y = axisFromTicks(doc, 0, 'y', 'linear');
    const ys = pathVertices(doc.querySelector('path.history')?.getAttribute('d') ?? '').map(([, py]) => py);
    const extreme = peak > 0 ? Math.min(...ys) : Math.max(...ys);
    expect(extreme).toBeCloseTo(y(peak), 1);
    expect(doc.querySelector('g.notes')?.textContent).toContain('pixel column');
  });

  it('husid: marks 5, 75 and 95% at their times', () => {
    const doc = parseSvg(figures.husid.svg);
    const levels = [...doc.querySelectorAll('g.level')].map((g) => Number(g.getAttribute('data-level')));
    expect(levels).toEqual([0.05, 0.75, 0.95]);
  });

  it('floor: marks the building period', () => {
    const doc = parseSvg(figures.floor.svg);
    expect(doc.querySelector('g.building-period')?.getAttribute('data-period-s')).toBe('0.5');
    const legend = doc.querySelector('g.legend')?.textContent ?? '';
    expect(legend).toContain('floor, broadened');
    expect(legend).toContain('not broadened');
    expect(legend).toContain('ground');
  });
});
