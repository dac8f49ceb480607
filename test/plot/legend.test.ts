import { describe, expect, it } from 'vitest';
import { drawLegend } from '../../src/plot/legend.js';
import { seriesStyle } from '../../src/plot/styles.js';
import { createSvgDocument } from '../../src/plot/svg.js';
import { parseSvg } from './helpers.js';

const entry = (label: string, index: number) => ({
  series: { label, x: [], y: [] },
  style: seriesStyle(index),
});

describe('drawLegend', () => {
  it('places the title and the entries in rows that fit, as a hand layout gives', () => {
    // 10 px type at 0.6 em a character; an entry is a 30 px sample, 5 px, its label and 16 px.
    // "Damping:" 8 × 6 + 16 = 64; "ζ = 2%" and "ζ = 5%" 35 + 36 + 16 = 87; "ζ = 10%" 35 + 42 + 16 = 93.
    // In 250 px: 64 + 87 + 87 = 238 fit on the first row, 238 + 93 = 331 does not.
    const doc = createSvgDocument(640, 400);
    const labels = ['ζ = 2%', 'ζ = 5%', 'ζ = 10%'];
    const end = drawLegend(
      doc,
      labels.map((label, i) => entry(label, i)),
      'Damping:',
      { left: 20, top: 100, widthPx: 250 },
    );
    expect(end).toBe(100 + 2 * 16 + 6); // two rows of 16 px and 6 px below
    const legend = parseSvg(doc.serialize()).querySelector('g.legend')!;
    const texts = [...legend.querySelectorAll('text')].map((t) => [
      t.textContent,
      Number(t.getAttribute('x')),
      Number(t.getAttribute('y')),
    ]);
    // Row middles at 100 + 10 and 100 + 26; text baselines 0.35 em below them.
    expect(texts).toEqual([
      ['Damping:', 20, 113.5],
      ['ζ = 2%', 20 + 64 + 35, 113.5],
      ['ζ = 5%', 20 + 151 + 35, 113.5],
      ['ζ = 10%', 20 + 35, 129.5],
    ]);
    const samples = [...legend.querySelectorAll('line.legend-sample')];
    expect(samples.map((s) => [Number(s.getAttribute('x1')), Number(s.getAttribute('x2'))])).toEqual([
      [84, 114],
      [171, 201],
      [20, 50],
    ]);
    expect(samples.map((s) => s.getAttribute('stroke'))).toEqual(labels.map((_, i) => seriesStyle(i).color));
    expect(samples[1].getAttribute('stroke-dasharray')).toBe(seriesStyle(1).dash);
  });

  it('draws nothing and takes no room without entries, even with a title', () => {
    const doc = createSvgDocument(640, 100);
    expect(drawLegend(doc, [], 'Damping:', { left: 0, top: 42, widthPx: 500 })).toBe(42);
    expect(parseSvg(doc.serialize()).querySelector('g.legend')).toBeNull();
  });

  it('a label holding markup is text (escaped by the serializer, XML 1.0 §2.4)', () => {
    const doc = createSvgDocument(640, 100);
    drawLegend(doc, [entry('<b> & "east"', 0)], undefined, { left: 0, top: 0, widthPx: 500 });
    const svg = doc.serialize();
    expect(svg).toContain('&lt;b&gt; &amp; "east"');
    expect(parseSvg(svg).querySelector('g.legend text')?.textContent).toBe('<b> & "east"');
  });
});
