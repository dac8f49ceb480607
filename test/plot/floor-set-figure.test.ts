import { describe, expect, it } from 'vitest';
import { EVERY_FIGURE, parseSvg } from './helpers.js';

describe('floorSetFigure', () => {
  const doc = parseSvg(EVERY_FIGURE.floorSet().svg);
  const paths = (panel: number) => [...doc.querySelectorAll(`g.panel[data-panel="${panel}"] g.curves path`)];

  it('one panel per damping, each with every record thin, the mean dashed and the envelope bold, the building period marked', () => {
    for (const panel of [0, 1]) {
      const drawn = paths(panel);
      expect(drawn.map((p) => p.getAttribute('class'))).toEqual(['curve', 'curve', 'mean', 'envelope']);
      const width = (p: Element) => Number(p.getAttribute('stroke-width'));
      expect(width(drawn[3])).toBeGreaterThan(Math.max(width(drawn[0]), width(drawn[1]), width(drawn[2])));
      expect(drawn[2].getAttribute('stroke-dasharray')).not.toBe('none');
      expect(drawn[3].getAttribute('stroke-dasharray')).toBe('none');
      expect(doc.querySelector(`g.panel[data-panel="${panel}"] g.building-period`)).not.toBeNull();
    }
    const labels = [...doc.querySelectorAll('text.panel-label')].map((t) => t.textContent);
    expect(labels).toEqual(['ζ = 2%', 'ζ = 5%']);
  });

  it('a legend naming each record once, the mean and the envelope', () => {
    const legend = [...doc.querySelectorAll('g.legend text')].map((t) => t.textContent);
    expect(legend).toHaveLength(4);
    expect(legend.slice(2)).toEqual(['mean of 2', 'envelope']);
  });

  it('says the peaks were broadened on each record before the mean and the envelope', () => {
    expect(doc.documentElement.textContent).toContain(
      "Peaks broadened on each record's floor spectrum before the mean and the envelope were taken",
    );
  });
});
