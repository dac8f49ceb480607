import { JSDOM } from 'jsdom';
import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { anchorPlanSvg } from '../../src/plot/anchor-plan-figure.js';

describe('anchorPlanSvg', () => {
  it('escapes text from files, uses sans-serif, carries the caution and units', () => {
    const svg = anchorPlanSvg({
      title: 'Pump <P-7> & "co" (invented)',
      forceUnit: 'kN',
      lengthUnit: 'm',
      anchors: [
        { x: 0, y: 0, tension: 1 },
        { x: 1, y: 0, tension: 2 },
        { x: 0, y: 1, tension: 0 },
      ],
      governingAnchor: 1,
      directionDeg: 45,
      cgPlan: [0.3, 0.3],
      centroid: [1 / 3, 1 / 3],
    });
    const document = new JSDOM(svg, { contentType: 'image/svg+xml' }).window.document;
    expect(document.querySelector('parsererror')).toBeNull();
    expect(document.querySelector('title')?.textContent).toBe('Pump <P-7> & "co" (invented)');
    expect(svg).toMatch(/font-family="sans-serif"/);
    expect(svg).toMatch(/x \(m\)/);
    expect(svg).toMatch(/T = 2 kN \(governs\)/);
    const text = Array.from(document.querySelectorAll('text'), (t) => t.textContent).join(' ');
    expect(text.replace(/\s+/g, ' ')).toContain(CAUTION.slice(0, 40));
  });
});
