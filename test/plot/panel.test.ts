import { describe, expect, it } from 'vitest';
import { decimatedIndices, drawAxisTitle, drawFrame, drawTickLabels } from '../../src/plot/panel.js';
import { createSvgDocument } from '../../src/plot/svg.js';
import { parseSvg } from './helpers.js';

describe('decimatedIndices', () => {
  it('keeps the first, lowest, highest and last point of each pixel column, in order (common practice)', () => {
    // 1000 samples of a sine over 10 columns: each column holds 100 samples.
    const values = Float64Array.from({ length: 1000 }, (_, i) => Math.sin(i / 7) + (i === 537 ? 5 : 0));
    const kept = decimatedIndices(
      1000,
      (i) => i / 100,
      (i) => values[i],
      () => true,
    );
    expect(kept.length).toBeLessThanOrEqual(40);
    expect(kept).toEqual([...kept].sort((a, b) => a - b));
    expect(kept).toContain(537); // the spike survives
    for (let column = 0; column < 10; column++) {
      const slice = Array.from(values.subarray(column * 100, column * 100 + 100));
      const inColumn = kept.filter((i) => Math.floor(i / 100) === column).map((i) => values[i]);
      expect(Math.max(...inColumn)).toBe(Math.max(...slice));
      expect(Math.min(...inColumn)).toBe(Math.min(...slice));
      expect(kept).toContain(column * 100);
      expect(kept).toContain(column * 100 + 99);
    }
  });
});

describe('the parts of a panel the anchor plan shares', () => {
  it('draws the frame, tick labels carrying their values, and axis titles (y turned up its side)', () => {
    const doc = createSvgDocument(640, 400);
    const plot = { left: 50, top: 20, width: 300, height: 200 };
    drawFrame(doc, doc.root, plot);
    const ticks = {
      major: [0, 1],
      minor: [],
      labels: [
        { value: 0, text: '0' },
        { value: 1.25, text: '1.25' },
      ],
    };
    drawTickLabels(doc, doc.root, 'y', ticks, (v) => ({ x: 43, y: 220 - 100 * v }));
    drawAxisTitle(doc, doc.root, 'y', 'Height h (m)', [24.5, 120]);
    drawAxisTitle(doc, doc.root, 'x', 'Width b (m)', [200, 260]);
    const svg = parseSvg(doc.serialize());
    const frame = svg.querySelector('rect.frame')!;
    expect(['x', 'y', 'width', 'height', 'fill'].map((a) => frame.getAttribute(a))).toEqual([
      '50',
      '20',
      '300',
      '200',
      'none',
    ]);
    const labels = [...svg.querySelectorAll('g.y-ticks text')];
    expect(svg.querySelector('g.y-ticks')?.getAttribute('text-anchor')).toBe('end');
    expect(labels.map((t) => [t.textContent, t.getAttribute('y'), t.getAttribute('data-value')])).toEqual([
      ['0', '220', '0'],
      ['1.25', '95', '1.25'],
    ]);
    expect(svg.querySelector('text.y-title')?.getAttribute('transform')).toBe(
      'translate(24.5, 120) rotate(-90)',
    );
    const xTitle = svg.querySelector('text.x-title')!;
    expect([xTitle.getAttribute('x'), xTitle.getAttribute('y'), xTitle.textContent]).toEqual([
      '200',
      '260',
      'Width b (m)',
    ]);
  });
});
