import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
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
