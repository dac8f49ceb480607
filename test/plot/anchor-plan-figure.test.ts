import { JSDOM } from 'jsdom';
import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { anchorPlanSvg, directionLabelSpot } from '../../src/plot/anchor-plan-figure.js';
import { textWidthPx } from '../../src/plot/ticks.js';

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

  it("puts the direction's label where it meets no anchor and no anchor's label", () => {
    // Invented pattern: an anchor just past the arrow's tip, where the label used to go.
    const svg = anchorPlanSvg({
      title: 'Crowded plan (invented)',
      forceUnit: 'kN',
      lengthUnit: 'm',
      anchors: [
        { x: -1, y: -1, tension: 4 },
        { x: 1, y: -1, tension: 2 },
        { x: 1, y: 1, tension: 1 },
        { x: -1, y: 1, tension: 2 },
        { x: 0.8, y: 0.72, tension: 3 },
      ],
      governingAnchor: 0,
      directionDeg: 45,
      cgPlan: [0, 0],
      centroid: [0, 0],
    });
    const document = new JSDOM(svg, { contentType: 'image/svg+xml' }).window.document;
    const label = document.querySelector('.direction text') as Element;
    const width = textWidthPx(label.textContent ?? '', 9.5);
    const x = Number(label.getAttribute('x'));
    const left = label.getAttribute('text-anchor') === 'end' ? x - width : x;
    const y = Number(label.getAttribute('y'));
    const box = [left, y - 7.6, left + width, y + 2.4];
    const meets = (b: number[]) => box[0] < b[2] && b[0] < box[2] && box[1] < b[3] && b[1] < box[3];
    for (const anchor of document.querySelectorAll('.anchor')) {
      const c = anchor.querySelector('circle') as Element;
      const [cx, cy, r] = ['cx', 'cy', 'r'].map((k) => Number(c.getAttribute(k)));
      expect(meets([cx - r, cy - r, cx + r, cy + r])).toBe(false);
      const t = anchor.querySelector('text') as Element;
      const half = textWidthPx(t.textContent ?? '', 9.5) / 2;
      const [tx, ty] = [Number(t.getAttribute('x')), Number(t.getAttribute('y'))];
      expect(meets([tx - half, ty - 7.6, tx + half, ty + 2.4])).toBe(false);
    }
  });

  it('keeps the first place beside the tip when it is free, and a later one when it is taken', () => {
    const frame: [number, number, number, number] = [0, 0, 400, 400];
    const first = directionLabelSpot('force direction 45.0°', [200, 200], [0.7, -0.7], [], frame);
    expect(first).toEqual({ x: 206, y: 194, anchor: 'start' });
    const taken: [number, number, number, number][] = [[200, 180, 330, 200]];
    const moved = directionLabelSpot('force direction 45.0°', [200, 200], [0.7, -0.7], taken, frame);
    expect(moved).not.toEqual(first);
  });
});
