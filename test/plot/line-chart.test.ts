import { describe, expect, it } from 'vitest';
import { lineChart } from '../../src/plot/line-chart.js';
import { parseSvg } from './helpers.js';

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
