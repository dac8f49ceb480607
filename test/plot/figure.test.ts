import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { renderFigure } from '../../src/plot/figure.js';
import { EVERY_FIGURE, NASTY, parseSvg } from './helpers.js';

/** The drawn curves of a figure: data curves and overlays (reference lines are counted apart). */
function curvePaths(doc: Document, name: string): Element[] {
  if (name === 'anchor-plan') return [...doc.querySelectorAll('g.anchor circle')];
  return [...doc.querySelectorAll('g.curves path')].filter(
    (p) => !['reference', 'legend-only'].includes(p.getAttribute('class') ?? ''),
  );
}

describe('every figure', () => {
  for (const [name, draw] of Object.entries(EVERY_FIGURE)) {
    const { svg, curves } = draw();

    it(`${name}: parses as XML (XML 1.0 well-formedness), 640 px wide, sans-serif, one path per curve, the caution in the footer`, () => {
      const doc = parseSvg(svg);
      expect(doc.documentElement.localName).toBe('svg');
      expect(doc.documentElement.getAttribute('font-family')).toBe('sans-serif');
      expect(doc.documentElement.getAttribute('width')).toBe('640');
      expect(curvePaths(doc, name)).toHaveLength(curves);
      const caution = [...doc.querySelectorAll('g.caution text')].map((t) => t.textContent).join(' ');
      expect(caution).toBe(CAUTION);
    });

    if (name === 'design') continue; // no record name: the spectrum's own description
    it(`${name}: escapes a name holding <, &, and quotes and reads it back unchanged`, () => {
      expect(svg).not.toContain('<7>');
      expect(svg).toContain('&lt;7&gt; &amp;');
      expect(parseSvg(svg).querySelector('g.header')?.textContent).toContain(NASTY);
    });
  }
});

describe('renderFigure', () => {
  it('stacks the panels and the legend under the header as a hand layout of the page gives', () => {
    const svg = renderFigure({
      title: 'Invented figure',
      panels: [
        {
          heightPx: 100,
          x: { title: 'x', scale: 'linear', domain: [0, 1] },
          y: { title: 'y', scale: 'linear', domain: [0, 1000] },
          series: [{ label: 'one', x: [0, 1], y: [0, 1000] }],
          xLabels: false,
        },
        {
          heightPx: 80,
          gapAbovePx: 16,
          x: { title: 'x', scale: 'linear', domain: [0, 1] },
          y: { title: 'y', scale: 'linear', domain: [0, 1] },
          series: [{ label: 'two', x: [0, 1], y: [1, 0] }],
        },
      ],
      rightMarginPx: 104,
    });
    const doc = parseSvg(svg);
    const frames = [...doc.querySelectorAll('rect.frame')].map((r) =>
      ['x', 'y', 'width', 'height'].map((a) => Number(r.getAttribute(a))),
    );
    // Left of the plots: the 14 px margin, the 10.5 px axis title, 8 px, the widest y label (0.6 em
    // a character of 10 px type), 7 px. Right: the margin asked for. The page is 640 px wide.
    const widest = Math.max(
      ...[...doc.querySelectorAll('g.y-ticks text')].map((t) => t.textContent!.length * 6),
    );
    const left = 14 + 10.5 + 8 + widest + 7;
    // Top: the header (10 px, one 17 px title line), 10 px; the first panel has no x labels (10 px
    // under it), the second is 16 px lower still.
    expect(frames[0]).toEqual([left, 37, 640 - left - 104, 100]);
    expect(frames[1]).toEqual([left, 37 + 100 + 10 + 16, 640 - left - 104, 80]);
    expect(doc.querySelectorAll('g.panel[data-panel="0"] g.x-ticks')).toHaveLength(0);
    // The legend: under the second panel's tick labels (7 + 10 px) and axis title (6 + 10.5 px), 12 px.
    const legendTop = 37 + 100 + 10 + 16 + 80 + 10 + 8 + 10.5 + 12;
    const legendText = doc.querySelector('g.legend text')!;
    expect(Number(legendText.getAttribute('y'))).toBe(legendTop + 10 + 3.5);
    expect(Number(legendText.getAttribute('x'))).toBe(left + 35);
    expect([...doc.querySelectorAll('g.legend text')].map((t) => t.textContent)).toEqual(['one', 'two']);
  });
});
