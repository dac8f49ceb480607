import { describe, expect, it } from 'vitest';
import { axisFromTicks, EVERY_FIGURE, parseSvg, pathVertices } from './helpers.js';

describe('dampingFigure', () => {
  it('the published ratios are horizontal lines at EC8 η(ξ)/η(5%) = √(10/(5+ξ))/1 (EN 1998-1 Eq. 3.6)', () => {
    const doc = parseSvg(EVERY_FIGURE.damping().svg);
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

  it('dashes mean the damping ratio alone: each published line has the dash of its damping curve', () => {
    const doc = parseSvg(EVERY_FIGURE.damping().svg);
    const dashOf = (path: Element) => path.getAttribute('stroke-dasharray');
    const lower = doc.querySelectorAll('g.panel')[1];
    const curves = new Map(
      [...lower.querySelectorAll('path.curve')].map((p) => [p.getAttribute('data-label'), dashOf(p)]),
    );
    for (const line of lower.querySelectorAll('path.reference')) {
      const damping = (line.getAttribute('data-label') ?? '').split(', ')[1];
      expect(dashOf(line)).toBe(curves.get(damping));
    }
    // No legend entry of a dash that means a source.
    expect(doc.querySelector('g.legend')?.textContent).not.toMatch(/Newmark–Hall|EC8/);
  });
});
